import { ageInYears, type VitalsPatient } from '@lockstep/shared';
import type { PcaOrder } from '../orders/entities/pca-order.entity.js';

/**
 * Who the breathing bands and NEWS2 are for: the patient's age at the observation, whether the ward is a
 * children's ward (a ward with weight-based dosing is the paediatric population), and the SpO2 scale the
 * prescriber chose (PUT /api/patients/:id/spo2-scale). Expects `patient.ward` loaded.
 */
export function vitalsPatientOf(order: PcaOrder, at: Date): VitalsPatient {
  const dateOfBirth = order.patient.dateOfBirth;
  return {
    ageYears: dateOfBirth ? ageInYears(dateOfBirth, at) : null,
    paediatricWard: order.patient.ward.weightBasedDosing,
    spo2Scale: order.patient.spo2Scale === '2' ? '2' : '1',
  };
}
