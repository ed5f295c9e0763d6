import 'reflect-metadata';
import './support/lift-password-rate-limit.js';
import request from 'supertest';
import { describe } from 'vitest';
import { BolusDto, DiscontinueDto, SyringeChangeDto } from '../src/bedside/dto/bedside-actions.dto.js';
import { NaloxoneDto, PauseDto, ResumeDto } from '../src/bedside/dto/pause.dto.js';
import { FirstCheckDto, SecondCheckDto } from '../src/bedside/dto/bedside-check.dto.js';
import { AcknowledgeFlagDto } from '../src/flags/dto/acknowledge-flag.dto.js';
import { CreateSignoffDto } from '../src/handover/dto/create-signoff.dto.js';
import { CreateObservationDto } from '../src/observations/dto/create-observation.dto.js';
import {
  ACKNOWLEDGE_FLAG,
  BOLUS,
  DISCONTINUE,
  NALOXONE,
  PAUSE,
  RESUME,
  FIRST_CHECK,
  OBSERVATION,
  SECOND_CHECK,
  SIGNOFF,
  SYRINGE_CHANGE,
} from './support/bad-input-specs.js';
import { type BadInputApp, badInputSuite, type BadInputRoute } from './support/bad-input-harness.js';
import { CALM_OBSERVATION, RELEASE, ROSA, SETTINGS } from './support/pca.js';
import { activeOrder, verifiedOrderWithSyringe } from './support/pca-steps.js';
import { PATIENT_1 } from './support/test-app.js';

const HARBOUR = 1; // the ward of patient 1, and of the patients TestApp.addPatient copies from him

/** Entities in the state each route expects, made through the API in setup. */
const state = {
  released: { id: 0, code: '', patient: PATIENT_1 },
  checkPending: { id: 0, checkId: 0 },
  active: { id: 0, code: '' },
  spareCode: '',
  flagId: 0,
};

async function setUp({ t, tokens }: BadInputApp): Promise<void> {
  const pca = { prescriber: tokens.prescriber, pharmacist: tokens.pharmacist, nurse: tokens.nurse };
  const nurse = { Authorization: `Bearer ${tokens.nurse}` };
  // One patient each: a patient may have only one open PCA.
  state.released = await verifiedOrderWithSyringe(t.http, pca, await t.addPatient());
  const pending = await verifiedOrderWithSyringe(t.http, pca, await t.addPatient());
  const first = await request(t.http)
    .post(`/api/orders/${pending.id}/bedside-checks`)
    .set(nurse)
    .send({ ...pending.patient.identity, releaseCode: pending.code, settings: SETTINGS })
    .expect(201);
  state.checkPending = { id: pending.id, checkId: first.body.id };
  state.active = await activeOrder(t.http, pca, await t.addPatient());
  const spare = await request(t.http)
    .post(`/api/orders/${state.active.id}/releases`)
    .set({ Authorization: `Bearer ${tokens.pharmacist}` })
    .send({ ...RELEASE, secondSyringeReason: 'Replacement for the running syringe' })
    .expect(201);
  state.spareCode = spare.body.releaseCode;
  const sedated = await request(t.http)
    .post(`/api/orders/${state.active.id}/observations`)
    .set(nurse)
    .send({ ...OBSERVATION_BODY, sedationLevel: '3' })
    .expect(201);
  state.flagId = sedated.body.flags[0].id;
}

const OBSERVATION_BODY = { ...CALM_OBSERVATION, note: 'Comfortable, settled' };

const ROUTES: BadInputRoute[] = [
  {
    method: 'POST',
    path: '/api/orders/:orderId/bedside-checks',
    url: () => `/api/orders/${state.released.id}/bedside-checks`,
    role: 'nurse',
    spec: FIRST_CHECK,
    dto: FirstCheckDto,
    valid: () => ({ ...state.released.patient.identity, releaseCode: state.released.code, settings: SETTINGS }),
  },
  {
    method: 'POST',
    path: '/api/orders/:orderId/bedside-checks/:checkId/second',
    url: () => `/api/orders/${state.checkPending.id}/bedside-checks/${state.checkPending.checkId}/second`,
    role: 'nurse',
    spec: SECOND_CHECK,
    dto: SecondCheckDto,
    valid: () => ({ ...ROSA, settings: SETTINGS }),
  },
  {
    method: 'POST',
    path: '/api/orders/:orderId/boluses',
    url: () => `/api/orders/${state.active.id}/boluses`,
    role: 'nurse',
    spec: BOLUS,
    dto: BolusDto,
    valid: () => ({
      amount: 2,
      reason: 'Breakthrough pain on mobilising',
      overrideReason: 'Pain team agreed a larger bolus',
      witness: ROSA,
    }),
  },
  {
    method: 'POST',
    path: '/api/orders/:orderId/syringe-changes',
    url: () => `/api/orders/${state.active.id}/syringe-changes`,
    role: 'charge_nurse',
    spec: SYRINGE_CHANGE,
    dto: SyringeChangeDto,
    valid: () => ({ volumeInfusedMl: 45, wastedMl: 5, newReleaseCode: state.spareCode, witness: ROSA }),
  },
  {
    method: 'POST',
    path: '/api/orders/:orderId/discontinue',
    url: () => `/api/orders/${state.active.id}/discontinue`,
    role: 'nurse',
    spec: DISCONTINUE,
    dto: DiscontinueDto,
    valid: () => ({ reason: 'Prescriber stopped the PCA for oral analgesia', volumeInfusedMl: 48, wastedMl: 2, witness: ROSA }),
  },
  {
    method: 'POST',
    path: '/api/orders/:orderId/naloxone',
    url: () => `/api/orders/${state.active.id}/naloxone`,
    role: 'nurse',
    spec: NALOXONE,
    dto: NaloxoneDto,
    valid: () => ({ dose: 100, doseUnit: 'mcg', givenAt: new Date().toISOString(), signature: { password: 'not-checked-here' } }),
  },
  {
    method: 'POST',
    path: '/api/orders/:orderId/pause',
    url: () => `/api/orders/${state.active.id}/pause`,
    role: 'nurse',
    spec: PAUSE,
    dto: PauseDto,
    valid: () => ({ reason: 'Sedation 3: prescriber called' }),
  },
  {
    method: 'POST',
    path: '/api/orders/:orderId/resume',
    url: () => `/api/orders/${state.active.id}/resume`,
    role: 'nurse',
    spec: RESUME,
    dto: ResumeDto,
    valid: () => ({ reason: 'Rousable, prescriber agreed', settings: { ...SETTINGS }, witness: { ...ROSA, settings: { ...SETTINGS } } }),
  },
  {
    method: 'POST',
    path: '/api/orders/:orderId/observations',
    url: () => `/api/orders/${state.active.id}/observations`,
    role: 'nurse',
    spec: OBSERVATION,
    dto: CreateObservationDto,
    valid: () => ({ ...OBSERVATION_BODY, at: new Date().toISOString() }),
  },
  {
    method: 'POST',
    path: '/api/flags/:id/acknowledge',
    url: () => `/api/flags/${state.flagId}/acknowledge`,
    role: 'nurse',
    spec: ACKNOWLEDGE_FLAG,
    dto: AcknowledgeFlagDto,
    valid: () => ({ note: 'PCA paused, prescriber called, dose reduced' }),
  },
  {
    method: 'POST',
    path: '/api/wards/:wardId/handover/signoffs',
    url: () => `/api/wards/${HARBOUR}/handover/signoffs`,
    role: 'charge_nurse',
    spec: SIGNOFF,
    dto: CreateSignoffDto,
    valid: () => ({ orderId: state.active.id, role: 'incoming', settings: { ...SETTINGS }, signature: { password: 'not-checked-here' } }),
  },
];

describe('bad input: bedside, observations, flags and handover', () => {
  badInputSuite('bad-input-bedside', ROUTES, setUp);
});
