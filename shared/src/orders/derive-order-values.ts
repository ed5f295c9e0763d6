import { doseToVolumeMl } from '../dose/dose-to-volume.js';
import { maxDemandsPerHour } from '../dose/max-demands-per-hour.js';
import { maxFourHourDose } from '../dose/max-four-hour-dose.js';
import { maxHourlyDose } from '../dose/max-hourly-dose.js';
import type { Regimen } from '../dose/types.js';
import type { OrderDerivedValues } from './order-fields.schema.js';

/** The figures a prescriber and pharmacist read beside an order: volumes and the most it can give. */
export function deriveOrderValues(regimen: Regimen): OrderDerivedValues {
  return {
    demandDoseMl: doseToVolumeMl(regimen.demandDose, regimen.concentrationPerMl),
    basalRateMlPerHour: doseToVolumeMl(regimen.basalRatePerHour, regimen.concentrationPerMl),
    maxDemandsPerHour: maxDemandsPerHour(regimen.lockoutMinutes),
    maxHourlyDose: maxHourlyDose(regimen),
    maxFourHourDose: maxFourHourDose(regimen),
  };
}
