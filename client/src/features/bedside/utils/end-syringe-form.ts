import type { ColleagueRequest } from '@lockstep/shared';
import { readNumber, type NumberFieldValue } from '@/lib/number-input';

/** The part every end of a syringe shares: the two volumes and the witness. */
export type EndSyringeValues = {
  volumeInfusedMl: NumberFieldValue;
  wastedMl: NumberFieldValue;
  witness: ColleagueRequest;
};

/** A volume in mL: required, a plain number, not negative. */
export function volumeRule(emptyMessage: string) {
  return (value: NumberFieldValue): string | null => {
    const volume = readNumber(value);
    if (volume === null) return emptyMessage;
    if (volume === undefined || volume < 0) return 'Enter a number of mL';
    return null;
  };
}
