import type { Ward } from '@lockstep/shared';

/** A positive whole number from the address, or null. */
export function parseId(text: string | null): number | null {
  if (!text || !/^\d+$/.test(text)) return null;
  const id = Number(text);
  return Number.isSafeInteger(id) && id > 0 ? id : null;
}

/** The ward named in the address when it exists, otherwise the first ward; null while none are known. */
export function chooseWardId(requested: number | null, wards: readonly Ward[]): number | null {
  if (requested !== null && wards.some((ward) => ward.id === requested)) return requested;
  return wards[0]?.id ?? null;
}
