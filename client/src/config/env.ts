/** Build-time settings (`VITE_*`, fixed when the client is built). Nothing else reads import.meta.env. */

export const DEFAULT_IDLE_SIGN_OUT_MINUTES = 15;

/**
 * Minutes without activity before the client signs out: a whole or decimal number of at least 1;
 * anything else (unset, empty, "abc", "0") falls back to the default, since a ward computer must
 * never be left without it.
 */
export function parseIdleMinutes(raw: string | undefined): number {
  const text = raw?.trim() ?? '';
  if (!/^\d+(\.\d+)?$/.test(text)) return DEFAULT_IDLE_SIGN_OUT_MINUTES;
  const minutes = Number(text);
  return minutes >= 1 ? minutes : DEFAULT_IDLE_SIGN_OUT_MINUTES;
}

export const IDLE_SIGN_OUT_MINUTES = parseIdleMinutes(import.meta.env.VITE_IDLE_SIGN_OUT_MINUTES);
