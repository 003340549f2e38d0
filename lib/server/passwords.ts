import bcrypt from "bcryptjs";

const ROUNDS = 11;
// A real hash of a random string, used when the e-mail is unknown so that timing does not tell.
export const DUMMY_HASH = "$2b$11$1uhEtS6P5cuYiM/WQqH/2uvGuwfAsRlyxsYlTWoiPQ2uZh4HelTYm";

export async function hashPassword(password: string): Promise<string> {
  return bcrypt.hash(password, ROUNDS);
}

export async function verifyPassword(password: string, hash: string): Promise<boolean> {
  try {
    return await bcrypt.compare(password, hash);
  } catch {
    return false;
  }
}
