import bcrypt from 'bcryptjs';

export const hashPassword = (password: string, cost: number) => bcrypt.hash(password, cost);

// Compared against when the e-mail is unknown, so both failures take the same time.
const UNKNOWN_USER_HASH = bcrypt.hashSync('no such user in larderly', 12);

export async function checkPassword(password: string, hash: string | undefined) {
  const matches = await bcrypt.compare(password, hash ?? UNKNOWN_USER_HASH);
  return hash !== undefined && matches;
}
