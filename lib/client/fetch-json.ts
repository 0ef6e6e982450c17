/** The browser's one way to call the API: JSON in and out, the server's error message kept. */
export class ApiError extends Error {
  constructor(
    readonly status: number,
    readonly code: string,
    message: string,
    readonly path?: string,
  ) {
    super(message);
    this.name = "ApiError";
  }
}

export async function fetchJson<T = unknown>(url: string, init?: { method?: string; body?: unknown }): Promise<T> {
  const res = await fetch(url, {
    method: init?.method ?? "GET",
    headers: init?.body !== undefined ? { "content-type": "application/json" } : undefined,
    body: init?.body !== undefined ? JSON.stringify(init.body) : undefined,
  });
  if (res.status === 204) return undefined as T;
  const data: unknown = await res.json().catch(() => ({}));
  if (!res.ok) {
    const err = (data as { error?: { code?: string; message?: string; path?: string } }).error;
    throw new ApiError(res.status, err?.code ?? "HTTP", err?.message ?? `Request failed (${res.status}).`, err?.path);
  }
  return data as T;
}
