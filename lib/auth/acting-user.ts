import { getServerSession } from "next-auth";
import { findActingUser, type ActingUser } from "@/lib/data/users";
import { authOptions } from "./auth-options";

/**
 * The signed-in person with their firm, read fresh from the database on every
 * request so a disabled account or a removed membership takes effect at once.
 */
export async function getActingUser(): Promise<ActingUser | null> {
  const session = await getServerSession(authOptions);
  const id = (session?.user as { id?: string } | undefined)?.id;
  if (!id) return null;
  const user = await findActingUser(id);
  return user && !user.disabled ? user : null;
}
