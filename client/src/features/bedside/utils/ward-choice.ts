import type { Ward } from '@lockstep/shared';

/** `?ward=all`: every ward's PCAs. */
export const ALL_WARDS = 'all';

/** Which wards a nurse's list shows: every ward, or these (by id). */
export type WardChoice = typeof ALL_WARDS | readonly number[];

/**
 * Where the shown wards come from: the address (`?ward=`), the person's own wards (the default),
 * or every ward because the person is assigned to none (the screen says so).
 */
export type WardChoiceSource = 'address' | 'own' | 'no-own-wards';

export interface ResolvedWardChoice {
  wards: WardChoice;
  source: WardChoiceSource;
}

/** Reads `?ward=`: `all`, or ward ids separated by commas (`1,4`). Null when absent or holding no usable id. */
export function parseWardParam(value: string | null): WardChoice | null {
  if (value === null) return null;
  if (value.trim() === ALL_WARDS) return ALL_WARDS;
  const ids = value
    .split(',')
    .map((part) => (part.trim() === '' ? Number.NaN : Number(part)))
    .filter((id) => Number.isInteger(id) && id > 0);
  const unique = [...new Set(ids)];
  return unique.length > 0 ? unique : null;
}

/** The `?ward=` value for a choice: `all` or `1,4`. */
export function wardParamValue(choice: WardChoice): string {
  return choice === ALL_WARDS ? ALL_WARDS : choice.join(',');
}

/**
 * With no ward asked for: the person's own wards (those that still exist, once the wards are
 * known); every ward when they have none, so a nurse with no assignment still sees the round.
 */
export function defaultWardChoice(ownWardIds: readonly number[], knownWardIds: readonly number[] | null): ResolvedWardChoice {
  const own = knownWardIds ? ownWardIds.filter((id) => knownWardIds.includes(id)) : [...ownWardIds];
  return own.length > 0 ? { wards: own, source: 'own' } : { wards: ALL_WARDS, source: 'no-own-wards' };
}

/**
 * The wards a list shows: those in the address (unknown ids dropped once the wards are known;
 * while they load the address is trusted), else the person's own wards, else every ward.
 */
export function resolveWardChoice(
  param: string | null,
  ownWardIds: readonly number[],
  knownWardIds: readonly number[] | null,
): ResolvedWardChoice {
  const asked = parseWardParam(param);
  if (asked === ALL_WARDS) return { wards: ALL_WARDS, source: 'address' };
  if (asked) {
    const known = knownWardIds ? asked.filter((id) => knownWardIds.includes(id)) : asked;
    if (known.length > 0) return { wards: known, source: 'address' };
  }
  return defaultWardChoice(ownWardIds, knownWardIds);
}

/** Whether two choices show the same wards, whatever the order. */
export function sameWardChoice(a: WardChoice, b: WardChoice): boolean {
  if (a === ALL_WARDS || b === ALL_WARDS) return a === b;
  return a.length === b.length && a.every((id) => b.includes(id));
}

/** The orders on the chosen wards (all of them for every ward). */
export function onChosenWards<T extends { wardId: number }>(orders: readonly T[], choice: WardChoice): T[] {
  return choice === ALL_WARDS ? [...orders] : orders.filter((order) => choice.includes(order.wardId));
}

/** "Harbour", "Harbour and Summit", "Harbour, Cedar and Summit"; English joining. */
function joinNames(names: readonly string[]): string {
  if (names.length <= 1) return names[0] ?? '';
  return `${names.slice(0, -1).join(', ')} and ${names[names.length - 1]}`;
}

/**
 * The chosen wards by name, in the app's ward order: "Harbour and Summit", or "All wards". A
 * ward whose name is not known yet reads "ward 7".
 */
export function wardsPhrase(choice: WardChoice, wards: readonly Pick<Ward, 'id' | 'name'>[]): string {
  if (choice === ALL_WARDS) return 'All wards';
  const order = (id: number) => {
    const index = wards.findIndex((ward) => ward.id === id);
    return index < 0 ? Number.MAX_SAFE_INTEGER : index;
  };
  const names = [...choice]
    .sort((a, b) => order(a) - order(b) || a - b)
    .map((id) => wards.find((ward) => ward.id === id)?.name ?? `ward ${id}`);
  return joinNames(names);
}

/** "Harbour and Summit: 6 PCAs, sorted by due time"; "All wards: no PCA is running". */
export function observationsDueSummary(phrase: string, count: number): string {
  if (count === 0) return `${phrase}: no PCA is running`;
  return `${phrase}: ${count} PCA${count === 1 ? '' : 's'}, sorted by due time`;
}

/** "Harbour and Summit: 4 PCA orders waiting for a bedside check or running". */
export function bedsideOrdersSummary(phrase: string, count: number): string {
  if (count === 0) return `${phrase}: no PCA order waiting for a bedside check or running`;
  return `${phrase}: ${count} PCA order${count === 1 ? '' : 's'} waiting for a bedside check or running`;
}

/**
 * Where "Back to PCA orders" leads from an order on this ward: the nurse's usual list (her own
 * wards, no `?ward=`) when the ward is one of hers, else that ward's list.
 */
export function bedsideListWard(orderWardId: number | undefined, ownWardIds: readonly number[]): number | undefined {
  return orderWardId === undefined || ownWardIds.includes(orderWardId) ? undefined : orderWardId;
}
