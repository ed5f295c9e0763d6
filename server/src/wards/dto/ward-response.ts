import type { Ward as WardResponse } from '@lockstep/shared';
import type { Ward } from '../entities/ward.entity.js';

export function toWardResponse(ward: Ward): WardResponse {
  return {
    id: ward.id,
    code: ward.code,
    name: ward.name,
    specialty: ward.specialty,
    weightBasedDosing: ward.weightBasedDosing,
    population: ward.population,
  };
}
