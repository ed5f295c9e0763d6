import { formatDose, tallMan, type DoseUnit, type Drug, type PumpSettings } from '@lockstep/shared';

/** The display unit of a pump setting, e.g. 'mg/mL', 'mg/h', 'min'; '' for the drug. */
export function pumpSettingUnit(field: keyof PumpSettings, doseUnit: DoseUnit): string {
  switch (field) {
    case 'drugId':
      return '';
    case 'concentrationPerMl':
      return `${doseUnit}/mL`;
    case 'syringeVolumeMl':
      return 'mL';
    case 'lockoutMinutes':
      return 'min';
    case 'basalRatePerHour':
      return `${doseUnit}/h`;
    default:
      return doseUnit;
  }
}

/** A drug's name as every screen shows it: tall-man lettered. */
export function drugLabel(drugId: number, drugs: readonly Drug[]): string {
  const drug = drugs.find((candidate) => candidate.id === drugId);
  return drug ? tallMan(drug.genericName) : `Drug no. ${drugId}`;
}

/** One setting's value in safe format: "0.2 mg", "10 min", "HYDROmorphone", or "None". */
export function formatPumpSetting(field: keyof PumpSettings, value: number | null, doseUnit: DoseUnit, drugs: readonly Drug[]): string {
  if (value === null) return 'None';
  if (field === 'drugId') return drugLabel(value, drugs);
  return formatDose(value, pumpSettingUnit(field, doseUnit));
}
