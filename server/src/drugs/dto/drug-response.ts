import type { Drug as DrugResponse } from '@lockstep/shared';
import type { Drug } from '../entities/drug.entity.js';

export function toDrugResponse(drug: Drug): DrugResponse {
  return { id: drug.id, genericName: drug.genericName, doseUnit: drug.doseUnit };
}
