import bcrypt from 'bcryptjs';

/** bcrypt with cost 11: about 0.15 s per hash in pure JS on these machines, slow enough to resist guessing. */
const COST = 11;

export const hashPassword = (password: string): Promise<string> => bcrypt.hash(password, COST);
export const verifyPassword = (password: string, hash: string): Promise<boolean> => bcrypt.compare(password, hash);
