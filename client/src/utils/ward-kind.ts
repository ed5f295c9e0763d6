import type { Ward } from '@lockstep/shared';

export const CHILDRENS_WARD = 'Children’s ward';

/**
 * What kind of ward this is, said beside its name where a screen shows the ward: "Children’s ward" for a
 * paediatric population (observations judged by the children's bands), nothing for an adult ward.
 */
export function wardKindLabel(ward: Pick<Ward, 'population'> | null | undefined): string | null {
  return ward?.population === 'paediatric' ? CHILDRENS_WARD : null;
}
