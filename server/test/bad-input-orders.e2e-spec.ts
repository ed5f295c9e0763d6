import 'reflect-metadata';
import './support/lift-password-rate-limit.js';
import { describe } from 'vitest';
import { SignedRequestDto } from '../src/common/dto/signature.dto.js';
import { CreateReleaseDto } from '../src/releases/dto/create-release.dto.js';
import { CreateOrderDto } from '../src/orders/dto/create-order.dto.js';
import { OrderFieldsDto } from '../src/orders/dto/order-fields.dto.js';
import { ReasonDto } from '../src/orders/dto/reason.dto.js';
import { CREATE_ORDER, ORDER_FIELDS, REASON, RELEASE, SIGNED } from './support/bad-input-specs.js';
import { badInputSuite, type BadInputRoute } from './support/bad-input-harness.js';
import { ORDER, RELEASE as VALID_RELEASE } from './support/pca.js';
import { DEMO_PASSWORD } from './support/test-app.js';

// Demo orders (database/seed/demo-orders.ts): 1 awaiting verification, 2 verified with a ready
// syringe, 3 returned to the prescriber (patient 5, fentanyl).
const AWAITING = 1;
const VERIFIED = 2;
const RETURNED = 3;

const { reviewDate: _r, overrides: _o, signature: _s, ...ORDER_FIELDS_BODY } = ORDER;
const PREVIEW = { ...ORDER_FIELDS_BODY, indication: 'Pain after laparotomy', loadingDose: 2, oneHourLimit: 10 };
const OVERRIDE = { field: 'demandDose', reason: 'Opioid-tolerant; agreed with the pain team' };
const CREATE = { ...PREVIEW, reviewDate: '2030-01-02', overrides: [OVERRIDE], signature: { password: DEMO_PASSWORD } };
const REVISE = {
  ...CREATE,
  patientId: 5,
  drugId: 3,
  doseUnit: 'mcg',
  concentrationPerMl: 10,
  demandDose: 20,
  lockoutMinutes: 10,
  fourHourLimit: 300,
  loadingDose: 0,
  oneHourLimit: null,
};
const REASON_BODY = { reason: 'Duplicate of an order written in theatre' };

const ROUTES: BadInputRoute[] = [
  {
    method: 'POST',
    path: '/api/orders/preview',
    url: () => '/api/orders/preview',
    role: 'nurse',
    spec: ORDER_FIELDS,
    dto: OrderFieldsDto,
    valid: () => PREVIEW,
  },
  {
    method: 'POST',
    path: '/api/orders',
    url: () => '/api/orders',
    role: 'prescriber',
    spec: CREATE_ORDER,
    dto: CreateOrderDto,
    valid: () => CREATE,
  },
  {
    method: 'POST',
    path: '/api/orders/:id/revise',
    url: () => `/api/orders/${RETURNED}/revise`,
    role: 'prescriber',
    spec: CREATE_ORDER,
    dto: CreateOrderDto,
    valid: () => REVISE,
  },
  {
    method: 'POST',
    path: '/api/orders/:id/cancel',
    url: () => `/api/orders/${AWAITING}/cancel`,
    role: 'prescriber',
    spec: REASON,
    dto: ReasonDto,
    valid: () => REASON_BODY,
  },
  {
    method: 'POST',
    path: '/api/orders/:id/verify',
    url: () => `/api/orders/${AWAITING}/verify`,
    role: 'pharmacist',
    spec: SIGNED,
    dto: SignedRequestDto,
    valid: () => ({ signature: { password: DEMO_PASSWORD } }),
  },
  {
    method: 'POST',
    path: '/api/orders/:id/return',
    url: () => `/api/orders/${AWAITING}/return`,
    role: 'pharmacist',
    spec: REASON,
    dto: ReasonDto,
    valid: () => REASON_BODY,
  },
  {
    method: 'POST',
    path: '/api/orders/:id/reject',
    url: () => `/api/orders/${AWAITING}/reject`,
    role: 'pharmacist',
    spec: REASON,
    dto: ReasonDto,
    valid: () => REASON_BODY,
  },
  {
    method: 'POST',
    path: '/api/orders/:orderId/releases',
    url: () => `/api/orders/${VERIFIED}/releases`,
    role: 'pharmacist',
    spec: RELEASE,
    dto: CreateReleaseDto,
    valid: () => ({ ...VALID_RELEASE, overrideReason: 'Only a 100 mL syringe in stock' }),
  },
];

describe('bad input: orders, review and syringe release', () => {
  badInputSuite('bad-input-orders', ROUTES);
});
