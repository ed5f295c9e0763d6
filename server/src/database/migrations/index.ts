import { InitialSchema1764650000000 } from './1764650000000-initial-schema.js';

/** In order. Listed explicitly (not globbed) so tests and the built server run the same set. */
export const MIGRATIONS = [InitialSchema1764650000000];
