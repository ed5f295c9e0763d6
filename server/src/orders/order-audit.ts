import type { CreateOrderDto } from './dto/create-order.dto.js';

/** The key values of a signed order for its audit record (the signature password is never kept). */
export function orderAuditSummary(dto: Omit<CreateOrderDto, 'signature' | 'indication'>, revises?: number): Record<string, unknown> {
  return {
    patientId: dto.patientId,
    drugId: dto.drugId,
    concentrationPerMl: dto.concentrationPerMl,
    doseUnit: dto.doseUnit,
    loadingDose: dto.loadingDose ?? null,
    demandDose: dto.demandDose,
    lockoutMinutes: dto.lockoutMinutes,
    basalRatePerHour: dto.basalRatePerHour,
    oneHourLimit: dto.oneHourLimit ?? null,
    fourHourLimit: dto.fourHourLimit ?? null,
    clinicianBolusDose: dto.clinicianBolusDose ?? null,
    reviewDate: dto.reviewDate,
    ...(dto.overrides?.length ? { overrides: dto.overrides } : {}),
    ...(revises ? { revises } : {}),
  };
}
