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

/** Who may be either check of a bedside check, observe, give a clinician bolus, witness waste or sign a handover. */
export const BEDSIDE_ROLES: readonly Role[] = ['nurse', 'charge_nurse'];

/** Who writes, revises and cancels orders. */
export const PRESCRIBING_ROLES: readonly Role[] = ['prescriber'];

/** Who verifies orders, releases syringes and keeps the dose-limit library. */
export const PHARMACY_ROLES: readonly Role[] = ['pharmacist'];

/** Who records a patient's allergies and opioid tolerance: prescribers and pharmacists. */
export const PATIENT_RECORD_ROLES: readonly Role[] = ['prescriber', 'pharmacist'];

/** Who records a patient's weight: nurses and prescribers. */
export const WEIGHT_ROLES: readonly Role[] = ['nurse', 'charge_nurse', 'prescriber'];

/** Who reads the audit trail: the admin all of it, pharmacists its order and library events. */
export const AUDIT_ROLES: readonly Role[] = ['admin', 'pharmacist'];
