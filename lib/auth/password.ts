import bcrypt from "bcryptjs";

/** bcrypt cost factor: about 60 ms per hash on the 2-core machines Leeway is tested on. */
const COST = 10;

/** A real hash of a random password, compared against when the account does not exist, so timing does not tell. */
const DUMMY_HASH = "$2b$10$/ja.AotVJl7NfjADlOrJg.xcW15pSB2o5lZ5CycolPkSaGWPNC2bK";

export const MIN_PASSWORD_LENGTH = 10;

export function hashPassword(password: string): Promise<string> {
  return bcrypt.hash(password, COST);
}

/** Compares a password with a stored hash; with no hash it still spends the time of one comparison. */
export async function verifyPassword(password: string, hash: string | null | undefined): Promise<boolean> {
  const matches = await bcrypt.compare(password, hash ?? DUMMY_HASH);
  return Boolean(hash) && matches;
}
