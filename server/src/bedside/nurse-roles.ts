import type { Role } from '@lockstep/shared';

/** Who may be either check of a bedside check, give a clinician bolus or witness waste. */
export const BEDSIDE_ROLES: readonly Role[] = ['nurse', 'charge_nurse'];
