import { useQueries } from '@tanstack/react-query';
import type { LimitRuleResponse, OtherLibrary, Ward } from '@lockstep/shared';
import { activeLibraryQueryOptions } from './get-active-library';

export interface OtherActiveLibraries {
  /** The other wards' active libraries by ward name (a ward without one is left out); null until every answer is in. */
  libraries: OtherLibrary<LimitRuleResponse>[] | null;
}

/**
 * The active dose-limit libraries of the given wards (cached under libraryKeys.active, as each
 * ward's own screen caches it), for a rule the patient's ward has none for: a child on an adult
 * ward gets a children's ward's paediatric rule (shared chooseRule). A ward with no active
 * library (404) has no rules. Ordered by ward name, as the server searches them.
 */
export function useOtherActiveLibraries(wards: readonly Ward[]): OtherActiveLibraries {
  const sorted = [...wards].sort((a, b) => a.name.localeCompare(b.name));
  return useQueries({
    queries: sorted.map((ward) => ({ ...activeLibraryQueryOptions(ward.id), retry: false })),
    combine: (results) => ({
      libraries: results.some((result) => result.isPending)
        ? null
        : results.flatMap((result, index) => (result.data ? [{ wardName: sorted[index].name, rules: result.data.rules }] : [])),
    }),
  });
}
