import 'reflect-metadata';
import './support/lift-password-rate-limit.js';
import request from 'supertest';
import { describe, expect, it } from 'vitest';
import { LoginDto } from '../src/auth/dto/login.dto.js';
import { UpdateEquianalgesicFactorDto } from '../src/equianalgesic/dto/update-equianalgesic-factor.dto.js';
import { ApproveVersionDto } from '../src/library/dto/approve-version.dto.js';
import { CreateDraftDto } from '../src/library/dto/create-draft.dto.js';
import { ReplaceRulesDto } from '../src/library/dto/replace-rules.dto.js';
import { SendBackVersionDto } from '../src/library/dto/send-back-version.dto.js';
import { SubmitVersionDto } from '../src/library/dto/submit-version.dto.js';
import { CreateUserDto } from '../src/users/dto/create-user.dto.js';
import { UpdateUserDto } from '../src/users/dto/update-user.dto.js';
import { UpdateWardContactsDto } from '../src/wards/dto/update-ward-contacts.dto.js';
import { appRoutes } from './support/app-routes.js';
import { type BadInputApp, badInputSuite, type BadInputRoute } from './support/bad-input-harness.js';
import {
  APPROVE_VERSION,
  BAD_INPUT_COVERAGE,
  CREATE_DRAFT,
  CREATE_USER,
  EQUIANALGESIC_FACTOR,
  LOGIN,
  REPLACE_RULES,
  SEND_BACK_VERSION,
  SUBMIT_VERSION,
  UPDATE_USER,
  WARD_CONTACTS,
} from './support/bad-input-specs.js';
import { DEMO_PASSWORD } from './support/test-app.js';

// Demo data: user 4 is the nurse kai.mendes; library version 5 is Harbour's draft awaiting
// approval; Cedar (2) has no open version, so a new draft for it is valid.
const KAI = 4;
const HARBOUR = 1;
const CEDAR = 2;
const SUMMIT = 4;
const PENDING_VERSION = 5;
const state = { draftId: 0, pendingSubmittedAt: '' };

async function setUp({ t, tokens }: BadInputApp): Promise<void> {
  const draft = await request(t.http)
    .post('/api/library/versions')
    .set({ Authorization: `Bearer ${tokens.pharmacist}` })
    .send({ wardId: SUMMIT, note: 'Bad-input target' })
    .expect(201);
  state.draftId = draft.body.id;
  const pending = await request(t.http)
    .get(`/api/library/versions/${PENDING_VERSION}`)
    .set({ Authorization: `Bearer ${tokens.pharmacist}` })
    .expect(200);
  state.pendingSubmittedAt = pending.body.submittedAt;
}

const RULES = [
  {
    drugId: 1,
    concentrationPerMl: 1,
    doseUnit: 'mg',
    perKg: false,
    limits: { demandDose: { hardMin: 0.2, softMin: 0.5, softMax: 2, hardMax: 3 }, lockoutMinutes: { hardMin: 5, softMax: 20 } },
  },
  { drugId: 3, concentrationPerMl: 10, doseUnit: 'mcg', perKg: false, limits: { demandDose: { softMax: 20, hardMax: 30 } } },
];
const POLICY = {
  observationIntervalFirst24hMinutes: 60,
  observationIntervalMinutes: 120,
  respiratoryRateThreshold: 9,
  spo2Threshold: 92,
  syringeLowThresholdHours: 2,
  reconciliationToleranceMl: 0.5,
  painNotControlledScore: 7,
  painNotControlledRatio: 2,
  weightMaxAgeDays: 7,
  pharmacyEmail: 'pharmacy.harbour@kestrelbay.example',
  nurseInChargeEmail: '',
};

const ROUTES: BadInputRoute[] = [
  {
    method: 'POST',
    path: '/api/auth/login',
    url: () => '/api/auth/login',
    role: 'anonymous',
    spec: LOGIN,
    dto: LoginDto,
    valid: () => ({ username: 'kai.mendes', password: DEMO_PASSWORD }),
  },
  {
    method: 'POST',
    path: '/api/users',
    url: () => '/api/users',
    role: 'admin',
    spec: CREATE_USER,
    dto: CreateUserDto,
    valid: () => ({
      username: 'new.nurse',
      displayName: 'New Nurse',
      role: 'nurse',
      wardIds: [HARBOUR, CEDAR],
      password: 'a-long-enough-password',
    }),
  },
  {
    method: 'PATCH',
    path: '/api/users/:id',
    url: () => `/api/users/${KAI}`,
    role: 'admin',
    spec: UPDATE_USER,
    dto: UpdateUserDto,
    valid: () => ({ displayName: 'Kai Mendes', role: 'nurse', wardIds: [HARBOUR, SUMMIT], active: true, password: 'a-new-long-password' }),
  },
  {
    method: 'PATCH',
    path: '/api/wards/:wardId/policy',
    url: () => `/api/wards/${HARBOUR}/policy`,
    role: 'admin',
    // The admin changes the e-mail addresses alone; clinical settings go through a signed-off change (ward-policy-changes.e2e-spec.ts).
    spec: WARD_CONTACTS,
    dto: UpdateWardContactsDto,
    valid: () => ({ pharmacyEmail: POLICY.pharmacyEmail, nurseInChargeEmail: POLICY.nurseInChargeEmail }),
  },
  {
    method: 'POST',
    path: '/api/library/versions',
    url: () => '/api/library/versions',
    role: 'pharmacist',
    spec: CREATE_DRAFT,
    dto: CreateDraftDto,
    valid: () => ({ wardId: CEDAR, note: 'Tighter demand limits' }),
  },
  {
    method: 'PUT',
    path: '/api/library/versions/:id/rules',
    url: () => `/api/library/versions/${state.draftId}/rules`,
    role: 'pharmacist',
    spec: REPLACE_RULES,
    dto: ReplaceRulesDto,
    valid: () => ({ rules: RULES }),
  },
  {
    method: 'POST',
    path: '/api/library/versions/:id/submit',
    url: () => `/api/library/versions/${state.draftId}/submit`,
    role: 'pharmacist',
    spec: SUBMIT_VERSION,
    dto: SubmitVersionDto,
    valid: () => ({ note: 'Ready for a second pharmacist' }),
  },
  {
    method: 'POST',
    path: '/api/library/versions/:id/approve',
    url: () => `/api/library/versions/${PENDING_VERSION}/approve`,
    role: 'pharmacist',
    spec: APPROVE_VERSION,
    dto: ApproveVersionDto,
    valid: () => ({ signature: { password: DEMO_PASSWORD }, submittedAt: state.pendingSubmittedAt }),
  },
  {
    method: 'PUT',
    path: '/api/equianalgesic-factors/:drugId/:route',
    url: () => '/api/equianalgesic-factors/2/parenteral',
    role: 'pharmacist',
    spec: EQUIANALGESIC_FACTOR,
    dto: UpdateEquianalgesicFactorDto,
    // Hydromorphone after American Family Physician 2000;61(3):755.
    valid: () => ({ amount: 1.5, unit: 'mg', source: 'American Family Physician 2000;61(3):755', signature: { password: DEMO_PASSWORD } }),
  },
  {
    method: 'POST',
    path: '/api/library/versions/:id/send-back',
    url: () => `/api/library/versions/${PENDING_VERSION}/send-back`,
    role: 'pharmacist',
    spec: SEND_BACK_VERSION,
    dto: SendBackVersionDto,
    valid: () => ({ signature: { password: DEMO_PASSWORD }, comment: 'The morphine demand soft maximum needs a second look' }),
  },
];

describe('bad input: sign-in, users, ward policy and the dose-limit library', () => {
  const suite = badInputSuite('bad-input-admin', ROUTES, setUp);

  it('has bad-input tests (or no body) for every write route the app serves', () => {
    const writes = appRoutes(suite.t.app).filter((key) => /^(POST|PUT|PATCH|DELETE) \/api\//.test(key));
    expect(
      writes.filter((key) => !(key in BAD_INPUT_COVERAGE)),
      'write routes missing from BAD_INPUT_COVERAGE',
    ).toEqual([]);
    expect(
      Object.keys(BAD_INPUT_COVERAGE).filter((key) => !writes.includes(key)),
      'BAD_INPUT_COVERAGE rows for routes that do not exist',
    ).toEqual([]);
  });
});
