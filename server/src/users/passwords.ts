import bcrypt from 'bcryptjs';

// Cost 10 is the floor usually recommended for bcrypt; pure-JS bcryptjs takes ~70 ms at it here.
const BCRYPT_COST = 10;

// Compared against when the username is unknown, so a miss takes as long as a wrong password.
const TIMING_DUMMY_HASH = bcrypt.hashSync('lockstep-timing-dummy', BCRYPT_COST);

export function hashPassword(password: string): Promise<string> {
  return bcrypt.hash(password, BCRYPT_COST);
}

export function passwordMatches(password: string, hash: string | undefined): Promise<boolean> {
  return bcrypt.compare(password, hash ?? TIMING_DUMMY_HASH).then((same) => same && hash !== undefined);
}
