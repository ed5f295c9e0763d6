import { z } from 'zod';
import { doseUnitSchema } from '../drugs/drug.schema.js';
import type { Finding } from '../dose/types.js';
import type { LimitRuleResponse } from '../library/library.schema.js';

const amount = z.number().finite().nonnegative();
const optionalAmount = amount.nullable().optional();

/** The regimen fields of an order (BRIEF §6), as a prescriber enters them. */
export const orderFieldsSchema = z.object({
  patientId: z.number().int().positive(),
  drugId: z.number().int().positive(),
  concentrationPerMl: z.number().finite().positive('Concentration must be more than 0'),
  doseUnit: doseUnitSchema,
  loadingDose: optionalAmount,
  demandDose: amount,
  lockoutMinutes: z.number().finite().min(1, 'Lockout must be at least 1 minute'),
  basalRatePerHour: amount,
  oneHourLimit: optionalAmount,
  fourHourLimit: optionalAmount,
  clinicianBolusDose: optionalAmount,
  indication: z.string().trim().max(500).optional(),
});
export type OrderFields = z.infer<typeof orderFieldsSchema>;

export type OrderDerivedValues = {
  demandDoseMl: number;
  basalRateMlPerHour: number;
  maxDemandsPerHour: number;
  maxHourlyDose: number;
  maxFourHourDose: number;
};

export type OrderPreview = {
  derived: OrderDerivedValues;
  findings: Finding[];
  rule: LimitRuleResponse | null;
};
