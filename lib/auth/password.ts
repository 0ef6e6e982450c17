import bcrypt from "bcryptjs";

// Cost 12 is the usual balance for interactive sign-in on server hardware (common practice).
const COST = 12;

export function hashPassword(plain: string): Promise<string> {
  return bcrypt.hash(plain, COST);
}

export function verifyPassword(plain: string, hash: string): Promise<boolean> {
  return bcrypt.compare(plain, hash);
}
