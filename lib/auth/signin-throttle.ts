import { db } from "@/db/knex";
import { env } from "@/lib/env";

export type ThrottleVerdict = { allowed: true } | { allowed: false; message: string };

/**
 * Failed sign-ins are counted per e-mail and per IP address over a sliding
 * window, in PostgreSQL so every web process sees the same count.
 */
export async function checkSigninThrottle(email: string, ip: string): Promise<ThrottleVerdict> {
  const { SIGNIN_MAX_FAILURES: max, SIGNIN_WINDOW_MINUTES: minutes } = env();
  const since = new Date(Date.now() - minutes * 60_000);
  const [byEmail, byIp] = await Promise.all([
    failuresSinceLastSuccess(db().from("signin_attempts").whereRaw("lower(email) = lower(?)", [email]), since),
    failuresSinceLastSuccess(db().from("signin_attempts").where({ ip }), since),
  ]);
  if (byEmail >= max) {
    return { allowed: false, message: `Too many failed sign-ins for this account. Wait ${minutes} minutes and try again, or ask your firm admin to reset your password.` };
  }
  // The per-IP limit is wider: several colleagues may share one office address.
  if (byIp >= max * 4) {
    return { allowed: false, message: `Too many failed sign-ins from this network. Wait ${minutes} minutes and try again.` };
  }
  return { allowed: true };
}

export async function recordSigninAttempt(email: string, ip: string, succeeded: boolean): Promise<void> {
  await db().insert({ email: email.toLowerCase(), ip, succeeded }).into("signin_attempts");
}

type Query = ReturnType<ReturnType<typeof db>["from"]>;

async function failuresSinceLastSuccess(query: Query, since: Date): Promise<number> {
  const rows: { succeeded: boolean }[] = await query.clone().select("succeeded").where("at", ">=", since).orderBy("at", "desc").limit(200);
  let n = 0;
  for (const r of rows) {
    if (r.succeeded) break;
    n++;
  }
  return n;
}
