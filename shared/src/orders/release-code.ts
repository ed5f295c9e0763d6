/** No 0/O, 1/I/L, 5/S or 8/B pairs: each character reads one way on a printed label. */
export const RELEASE_CODE_ALPHABET = '234679ACDEFGHJKMNPQRTUVWXYZ';
export const RELEASE_CODE_LENGTH = 6;

/**
 * A release code from a source of random integers (`randomInt(n)` in [0, n)), in groups of three
 * for reading aloud: "K7M-4QX". Uniqueness is checked by the caller against issued codes.
 */
export function releaseCode(randomInt: (n: number) => number): string {
  let code = '';
  for (let i = 0; i < RELEASE_CODE_LENGTH; i++) code += RELEASE_CODE_ALPHABET[randomInt(RELEASE_CODE_ALPHABET.length)];
  return `${code.slice(0, 3)}-${code.slice(3)}`;
}

/** Accepts what a nurse types or a scanner sends: any case, with or without the dash or spaces. */
export function normaliseReleaseCode(input: string): string {
  const bare = input.toUpperCase().replace(/[\s-]/g, '');
  return bare.length === RELEASE_CODE_LENGTH ? `${bare.slice(0, 3)}-${bare.slice(3)}` : bare;
}
