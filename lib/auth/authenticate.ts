import { findUserForSignin } from "@/lib/data/users";
import { verifyPassword } from "./password";
import { checkSigninThrottle, recordSigninAttempt } from "./signin-throttle";

export type AuthenticateOptions = { email: string; password: string; ip: string };
export type AuthenticatedUser = { id: string; email: string; name: string };

/** Signs a person in, or throws an Error whose message is shown on the sign-in form. */
export async function authenticate({ email, password, ip }: AuthenticateOptions): Promise<AuthenticatedUser> {
  const verdict = await checkSigninThrottle(email, ip);
  if (!verdict.allowed) throw new Error(verdict.message);

  const user = await findUserForSignin(email);
  const ok = user?.passwordHash ? await verifyPassword(password, user.passwordHash) : false;
  if (!user || !ok) {
    await recordSigninAttempt(email, ip, false);
    throw new Error("E-mail or password is not right.");
  }
  if (user.disabled) {
    await recordSigninAttempt(email, ip, false);
    throw new Error("This account is disabled. Ask your firm admin.");
  }
  await recordSigninAttempt(email, ip, true);
  return { id: user.id, email: user.email, name: user.name };
}
