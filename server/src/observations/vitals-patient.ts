import { ageInYears, type Population, type VitalsPatient } from '@lockstep/shared';
import type { PcaOrder } from '../orders/entities/pca-order.entity.js';

/** What the bands need to know of a patient and their ward, as stored. */
export type VitalsPatientFacts = { dateOfBirth: string | null; wardPopulation: Population; spo2Scale: string | null };

/**
 * Who the breathing bands and NEWS2 are for at `at`: the patient's age then, whether the ward's population is
 * paediatric (the ward's own setting, not its weight-based dosing: how doses are checked is a separate fact),
 * and the SpO2 scale the prescriber chose (PUT /api/patients/:id/spo2-scale). The observation route and the
 * demo and scale seeds both use it, so seeded flags follow the same bands as recorded ones.
 */
export function vitalsPatient(facts: VitalsPatientFacts, at: Date): VitalsPatient {
  return {
    ageYears: facts.dateOfBirth ? ageInYears(facts.dateOfBirth, at) : null,
    paediatricWard: facts.wardPopulation === 'paediatric',
    spo2Scale: facts.spo2Scale === '2' ? '2' : '1',
  };
}

/** `vitalsPatient` for an order's patient. Expects `patient.ward` loaded. */
export function vitalsPatientOf(order: PcaOrder, at: Date): VitalsPatient {
  const { patient } = order;
  return vitalsPatient({ dateOfBirth: patient.dateOfBirth, wardPopulation: patient.ward.population, spo2Scale: patient.spo2Scale }, at);
}
