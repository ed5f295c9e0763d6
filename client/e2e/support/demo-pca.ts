import type { PumpSettings } from '@lockstep/shared';
import { DEMO_PASSWORD } from '../../../server/test/support/demo-accounts.js';
import { callApi } from './api.js';

// The demo's verified order: FALEOLO, Tavita (Harbour bed H07, KB100672, born 1979-07-28),
// HYDROmorphone 0.2 mg/mL, demand 0.2 mg, lockout 10 min, basal 0.1 mg/h, 4-hour limit 6 mg, with a
// ready 50 mL syringe released as HK3-7QT.
export const FALEOLO = { name: 'FALEOLO, Tavita', mrn: 'KB100672', dateOfBirth: '1979-07-28', releaseCode: 'HK3-7QT' };

/** The pump programmed as FALEOLO's order says. */
export const FALEOLO_PUMP: PumpSettings = {
  drugId: 2,
  concentrationPerMl: 0.2,
  syringeVolumeMl: 50,
  loadingDose: null,
  demandDose: 0.2,
  lockoutMinutes: 10,
  basalRatePerHour: 0.1,
  oneHourLimit: null,
  fourHourLimit: 6,
};

/** Both bedside checks through the API (the nurse whose token it is, then rosa.adeyemi): FALEOLO's PCA starts. */
export async function startFaleoloPca(baseUrl: string, nurseToken: string, orderId: number): Promise<void> {
  const first = await callApi<{ id: number }>(baseUrl, nurseToken, 'POST', `/orders/${orderId}/bedside-checks`, {
    patientMrn: FALEOLO.mrn,
    patientDateOfBirth: FALEOLO.dateOfBirth,
    releaseCode: FALEOLO.releaseCode,
    settings: FALEOLO_PUMP,
  });
  await callApi(baseUrl, nurseToken, 'POST', `/orders/${orderId}/bedside-checks/${first.id}/second`, {
    username: 'rosa.adeyemi',
    password: DEMO_PASSWORD,
    settings: FALEOLO_PUMP,
  });
}
