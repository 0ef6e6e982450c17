import type { Metadata } from "next";
import { notFound } from "next/navigation";
import { env } from "@/lib/env";
import { listCapturedMail } from "@/lib/mail/list-captured-mail";

export const metadata: Metadata = { title: "Captured mail" };
export const dynamic = "force-dynamic";

/** Development and tests only: what the fake SMTP server caught. Absent in production. */
export default async function CapturedMailPage() {
  if (env().APP_ENV === "production") notFound();
  const messages = await listCapturedMail();
  return (
    <section className="space-y-4">
      <h1>Captured mail</h1>
      <p className="text-sm text-ink-soft">Mail sent by this development server, caught by the local fake SMTP server. Nothing here left the machine.</p>
      {messages.length === 0 && <p className="text-ink-faint">No mail yet.</p>}
      <ol className="space-y-3">
        {messages.map((m) => (
          <li key={m.id} className="pp-panel p-4" data-testid="captured-mail">
            <div className="flex flex-wrap gap-x-4 text-xs text-ink-soft">
              <span>To: <span className="pp-num">{m.to.join(", ")}</span></span>
              <span>From: {m.from}</span>
              <span className="pp-num">{String(m.date)}</span>
            </div>
            <h2 className="mt-1">{m.subject}</h2>
            <pre className="mt-2 whitespace-pre-wrap font-mono text-xs">{m.text}</pre>
          </li>
        ))}
      </ol>
    </section>
  );
}
