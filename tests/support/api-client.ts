/**
 * A signed-in HTTP client for the running app: goes through next-auth's real
 * credentials flow (CSRF token, callback, session cookie), no shortcuts.
 */
export const BASE_URL = process.env.E2E_BASE_URL ?? "http://localhost:3100";

export type ApiResponse = { status: number; body: unknown; text: string };

export class ApiClient {
  private cookies = new Map<string, string>();

  static async signedIn(email: string, password: string): Promise<ApiClient> {
    const c = new ApiClient();
    const error = await c.signIn(email, password);
    if (error) throw new Error(`sign-in as ${email} failed: ${error}`);
    return c;
  }

  /** Returns null on success, else the error message next-auth reported. */
  async signIn(email: string, password: string): Promise<string | null> {
    const csrf = (await this.request("GET", "/api/auth/csrf")).body as { csrfToken: string };
    const form = new URLSearchParams({ csrfToken: csrf.csrfToken, email, password, json: "true", callbackUrl: `${BASE_URL}/projects` });
    const res = await this.raw("POST", "/api/auth/callback/credentials", form.toString(), "application/x-www-form-urlencoded");
    const location = res.headers.get("location") ?? "";
    const body = (await res.json().catch(() => ({}))) as { url?: string };
    const url = new URL(body.url ?? location ?? "", BASE_URL);
    const err = url.searchParams.get("error");
    if (err) return decodeURIComponent(err);
    return this.cookies.has("next-auth.session-token") ? null : `no session cookie (status ${res.status})`;
  }

  async request(method: string, path: string, body?: unknown, rawBody?: string): Promise<ApiResponse> {
    // FormData goes as multipart with the boundary fetch chooses; anything else as JSON.
    const payload = body instanceof FormData ? body : (rawBody ?? (body === undefined ? undefined : JSON.stringify(body)));
    const res = await this.raw(method, path, payload, payload === undefined || payload instanceof FormData ? undefined : "application/json");
    const text = await res.text();
    let parsed: unknown = undefined;
    try {
      parsed = text ? JSON.parse(text) : undefined;
    } catch {
      parsed = undefined; // not JSON (an HTML page); callers look at `text`
    }
    return { status: res.status, body: parsed, text };
  }

  /** The raw response, for binary bodies (images, PDFs). */
  get(path: string): Promise<Response> {
    return this.raw("GET", path, undefined, undefined);
  }

  private async raw(method: string, path: string, body: string | FormData | undefined, contentType: string | undefined): Promise<Response> {
    const headers: Record<string, string> = {};
    if (contentType) headers["content-type"] = contentType;
    if (this.cookies.size) headers.cookie = [...this.cookies].map(([k, v]) => `${k}=${v}`).join("; ");
    const res = await fetch(`${BASE_URL}${path}`, { method, headers, body, redirect: "manual" });
    for (const c of res.headers.getSetCookie()) {
      const [pair] = c.split(";");
      const i = pair.indexOf("=");
      this.cookies.set(pair.slice(0, i).trim(), pair.slice(i + 1).trim());
    }
    return res;
  }
}
