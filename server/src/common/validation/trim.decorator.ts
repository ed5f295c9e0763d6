import { Transform } from 'class-transformer';

/**
 * Trims text before it is validated, as the shared zod schemas do, so that "          " is not a
 * reason of ten characters and " " is not a name. Anything that is not text is left for the type check.
 */
export const Trim = () => Transform(({ value }: { value: unknown }) => (typeof value === 'string' ? value.trim() : value));
