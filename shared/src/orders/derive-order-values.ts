import { doseToVolumeMl } from '../dose/dose-to-volume.js';
import { maxDemandsPerHour } from '../dose/max-demands-per-hour.js';
import { possibleTotals } from '../dose/possible-totals.js';
import type { Regimen } from '../dose/types.js';
import type { OrderDerivedValues } from './order-fields.schema.js';

/**
 * The figures a prescriber and pharmacist read beside an order: volumes, and the most the pump can
 * give in any hour and any 4 hours (the first ones, with the loading dose, included). The maxima
 * are the same `possibleTotals` figures the order check compares with the limit rule.
 */
export function deriveOrderValues(regimen: Regimen): OrderDerivedValues {
  const totals = possibleTotals(regimen);
  return {
    demandDoseMl: doseToVolumeMl(regimen.demandDose, regimen.concentrationPerMl),
    basalRateMlPerHour: doseToVolumeMl(regimen.basalRatePerHour, regimen.concentrationPerMl),
    maxDemandsPerHour: maxDemandsPerHour(regimen.lockoutMinutes),
    maxHourlyDose: totals.firstHour.dose,
    maxFourHourDose: totals.firstFourHours.dose,
  };
}
