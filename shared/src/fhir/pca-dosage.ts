import { formatDose } from '../dose/format-dose.js';
import type { OrderSummary } from '../orders/order.schema.js';
import type { FhirCodeableConcept, FhirDosage } from './fhir-types.js';
import { PCA_LOCKOUT_EXTENSION_URL } from './fhir-systems.js';
import { doseQuantity, dosePerHours, hourlyRateQuantity, minutesDuration } from './ucum-quantity.js';

export type PcaRegimenSource = Pick<
  OrderSummary,
  | 'doseUnit'
  | 'loadingDose'
  | 'demandDose'
  | 'lockoutMinutes'
  | 'basalRatePerHour'
  | 'oneHourLimit'
  | 'fourHourLimit'
  | 'clinicianBolusDose'
>;

// Text only: no route or method code whose meaning we have not checked (docs/integration.md).
const INTRAVENOUS: FhirCodeableConcept = { text: 'Intravenous' };

const given = (amount: number | null | undefined): number | null => (amount != null && amount > 0 ? amount : null);

/**
 * A PCA regimen as R4 Dosage entries. Entries with the same `sequence` run at the same time and a
 * higher one follows (R4 Dosage.sequence), so the loading dose comes first and the PCA after it.
 * R4 allows one maxDosePerPeriod per Dosage and Lockstep's limits cap demand doses and basal
 * rate together, so each limit is an entry of its own rather than a cap on the demand dose alone.
 */
export function pcaDosageInstructions(order: PcaRegimenSource): FhirDosage[] {
  const { doseUnit } = order;
  const shown = (amount: number) => formatDose(amount, doseUnit);
  const loading = given(order.loadingDose);
  const basal = given(order.basalRatePerHour);
  const bolus = given(order.clinicianBolusDose);
  const sequence = loading === null ? 1 : 2;
  const dosages: FhirDosage[] = [];

  if (loading !== null) {
    dosages.push({
      sequence: 1,
      text: `Loading dose ${shown(loading)} intravenously, once, before the PCA starts`,
      timing: { repeat: { count: 1 } },
      route: INTRAVENOUS,
      method: { text: 'Loading dose' },
      doseAndRate: [{ doseQuantity: doseQuantity(loading, doseUnit) }],
    });
  }
  // The lockout twice: as the as-needed timing every FHIR reader understands ("at most once every
  // 10 min"), and exactly, in our extension.
  dosages.push({
    extension: [{ url: PCA_LOCKOUT_EXTENSION_URL, valueDuration: minutesDuration(order.lockoutMinutes) }],
    sequence,
    text: `Demand dose ${shown(order.demandDose)} intravenously when the patient presses the button; lockout ${formatDose(order.lockoutMinutes, 'min')}`,
    timing: { repeat: { frequency: 1, period: order.lockoutMinutes, periodUnit: 'min' } },
    asNeededBoolean: true,
    route: INTRAVENOUS,
    method: { text: 'Patient-controlled demand dose' },
    doseAndRate: [{ doseQuantity: doseQuantity(order.demandDose, doseUnit) }],
  });
  if (basal !== null) {
    dosages.push({
      sequence,
      text: `Basal rate ${shown(basal)}/h intravenously, continuous`,
      route: INTRAVENOUS,
      method: { text: 'Continuous infusion' },
      doseAndRate: [{ rateQuantity: hourlyRateQuantity(basal, doseUnit) }],
    });
  }
  for (const [hours, limit] of [
    [1, order.oneHourLimit],
    [4, order.fourHourLimit],
  ] as const) {
    if (limit == null) continue;
    dosages.push({
      sequence,
      text: `${hours}-hour limit: at most ${shown(limit)} in any ${hours === 1 ? 'hour' : `${hours} hours`}, demand doses and basal rate together`,
      maxDosePerPeriod: dosePerHours(limit, doseUnit, hours),
    });
  }
  if (bolus !== null) {
    dosages.push({
      sequence,
      text: `Clinician bolus ${shown(bolus)} intravenously as needed for breakthrough pain, given by a nurse with a second nurse's check`,
      asNeededCodeableConcept: { text: 'Breakthrough pain' },
      route: INTRAVENOUS,
      method: { text: 'Clinician bolus' },
      doseAndRate: [{ doseQuantity: doseQuantity(bolus, doseUnit) }],
    });
  }
  return dosages;
}
