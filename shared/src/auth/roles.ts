import { z } from 'zod';

export const ROLES = ['prescriber', 'pharmacist', 'nurse', 'charge_nurse', 'admin'] as const;
export const roleSchema = z.enum(ROLES);
export type Role = z.infer<typeof roleSchema>;

export const ROLE_LABELS: Record<Role, string> = {
  prescriber: 'Prescriber',
  pharmacist: 'Pharmacist',
  nurse: 'Nurse',
  charge_nurse: 'Charge nurse',
  admin: 'Admin',
};

/** Roles that care for patients and so see the ward patient list. */
export const CLINICAL_ROLES: readonly Role[] = ['prescriber', 'pharmacist', 'nurse', 'charge_nurse'];
