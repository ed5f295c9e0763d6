import 'reflect-metadata';
import { BadRequestException, type Type } from '@nestjs/common';
import { isEmail, isISO8601, isRFC3339, length } from 'class-validator';
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import type { z } from 'zod';
import {
  acknowledgeFlagSchema,
  addAllergySchema,
  approveVersionSchema,
  bolusSchema,
  createDraftSchema,
  createObservationSchema,
  spo2ScaleRequestSchema,
  createOrderSchema,
  createReleaseSchema,
  createSignoffSchema,
  createUserSchema,
  discontinueSchema,
  naloxoneSchema,
  pauseSchema,
  resumeSchema,
  firstCheckSchema,
  importLibraryFieldsSchema,
  isCalendarDay,
  isEmailAddress,
  isMoment,
  loginSchema,
  opioidToleranceSchema,
  orderFieldsSchema,
  reasonRequestSchema,
  recordWeightSchema,
  replaceRulesSchema,
  requestFieldErrors,
  secondCheckSchema,
  sendBackVersionSchema,
  signedRequestSchema,
  submitVersionSchema,
  syringeChangeSchema,
  textLength,
  updateUserSchema,
  updateEquianalgesicFactorSchema,
  updateWardContactsSchema,
  proposeWardPolicyChangeSchema,
  signOffWardPolicyChangeSchema,
  declineWardPolicyChangeSchema,
  type FieldError,
} from '@lockstep/shared';
import { LoginDto } from '../src/auth/dto/login.dto.js';
import { BolusDto, DiscontinueDto, SyringeChangeDto } from '../src/bedside/dto/bedside-actions.dto.js';
import { FirstCheckDto, SecondCheckDto } from '../src/bedside/dto/bedside-check.dto.js';
import { NaloxoneDto, PauseDto, ResumeDto } from '../src/bedside/dto/pause.dto.js';
import { SignedRequestDto } from '../src/common/dto/signature.dto.js';
import { createValidationPipe } from '../src/common/validation/validation.pipe.js';
import { UpdateEquianalgesicFactorDto } from '../src/equianalgesic/dto/update-equianalgesic-factor.dto.js';
import { AcknowledgeFlagDto } from '../src/flags/dto/acknowledge-flag.dto.js';
import { CreateSignoffDto } from '../src/handover/dto/create-signoff.dto.js';
import { ApproveVersionDto } from '../src/library/dto/approve-version.dto.js';
import { CreateDraftDto } from '../src/library/dto/create-draft.dto.js';
import { ImportLibraryDto } from '../src/library/dto/import-library.dto.js';
import { ReplaceRulesDto } from '../src/library/dto/replace-rules.dto.js';
import { SendBackVersionDto } from '../src/library/dto/send-back-version.dto.js';
import { SubmitVersionDto } from '../src/library/dto/submit-version.dto.js';
import { CreateObservationDto } from '../src/observations/dto/create-observation.dto.js';
import { CreateOrderDto } from '../src/orders/dto/create-order.dto.js';
import { OrderFieldsDto } from '../src/orders/dto/order-fields.dto.js';
import { ReasonDto } from '../src/orders/dto/reason.dto.js';
import { AddAllergyDto, OpioidToleranceDto, RecordWeightDto, Spo2ScaleDto } from '../src/patients/dto/patient-record.dto.js';
import { CreateReleaseDto } from '../src/releases/dto/create-release.dto.js';
import { CreateUserDto } from '../src/users/dto/create-user.dto.js';
import { UpdateUserDto } from '../src/users/dto/update-user.dto.js';
import { UpdateWardContactsDto } from '../src/wards/dto/update-ward-contacts.dto.js';
import { DeclineWardPolicyChangeDto, ProposeWardPolicyChangeDto } from '../src/wards/dto/ward-policy-change.dto.js';
import { type BadBody, badBodies, related, toJson } from './support/bad-bodies.js';
import {
  ACKNOWLEDGE_FLAG,
  ADD_ALLERGY,
  APPROVE_VERSION,
  BAD_INPUT_COVERAGE,
  BOLUS,
  CREATE_DRAFT,
  CREATE_ORDER,
  CREATE_USER,
  DISCONTINUE,
  NALOXONE,
  PAUSE,
  RESUME,
  EQUIANALGESIC_FACTOR,
  FIRST_CHECK,
  IMPORT_FIELDS,
  LOGIN,
  OBSERVATION,
  SPO2_SCALE,
  OPIOID_TOLERANCE,
  ORDER_FIELDS,
  REASON,
  RECORD_WEIGHT,
  RELEASE,
  REPLACE_RULES,
  SECOND_CHECK,
  SEND_BACK_VERSION,
  SIGNED,
  SIGNOFF,
  SUBMIT_VERSION,
  SYRINGE_CHANGE,
  UPDATE_USER,
  WARD_CONTACTS,
  PROPOSE_WARD_POLICY_CHANGE,
  DECLINE_WARD_POLICY_CHANGE,
} from './support/bad-input-specs.js';
import type { BodySpec } from './support/bad-values.js';
import { validBodies } from './support/valid-values.js';

// One request contract per write route: the shared zod schema (what the client checks) and the
// server's DTO behind the app's own validation pipe must accept the same bodies, refuse the same
// bodies, and name the same fields with the same first message.

type Contract = { spec: BodySpec; dto: Type; schema: z.ZodType };

const reason: Contract = { spec: REASON, dto: ReasonDto, schema: reasonRequestSchema };
const order: Contract = { spec: CREATE_ORDER, dto: CreateOrderDto, schema: createOrderSchema };

/** Every write route with a body; BAD_INPUT_COVERAGE lists the routes, so a new one fails here until it has a contract. */
const CONTRACTS: Record<string, Contract> = {
  'POST /api/orders/preview': { spec: ORDER_FIELDS, dto: OrderFieldsDto, schema: orderFieldsSchema },
  'POST /api/orders': order,
  'POST /api/orders/:param/revise': order,
  'POST /api/orders/:param/cancel': reason,
  'POST /api/orders/:param/verify': { spec: SIGNED, dto: SignedRequestDto, schema: signedRequestSchema },
  'POST /api/orders/:param/return': reason,
  'POST /api/orders/:param/reject': reason,
  'POST /api/orders/:param/releases': { spec: RELEASE, dto: CreateReleaseDto, schema: createReleaseSchema },
  'POST /api/orders/:param/bedside-checks': { spec: FIRST_CHECK, dto: FirstCheckDto, schema: firstCheckSchema },
  'POST /api/orders/:param/bedside-checks/:param/second': { spec: SECOND_CHECK, dto: SecondCheckDto, schema: secondCheckSchema },
  'POST /api/orders/:param/boluses': { spec: BOLUS, dto: BolusDto, schema: bolusSchema },
  'POST /api/orders/:param/syringe-changes': { spec: SYRINGE_CHANGE, dto: SyringeChangeDto, schema: syringeChangeSchema },
  'POST /api/orders/:param/discontinue': { spec: DISCONTINUE, dto: DiscontinueDto, schema: discontinueSchema },
  'POST /api/orders/:param/naloxone': { spec: NALOXONE, dto: NaloxoneDto, schema: naloxoneSchema },
  'POST /api/orders/:param/pause': { spec: PAUSE, dto: PauseDto, schema: pauseSchema },
  'POST /api/orders/:param/resume': { spec: RESUME, dto: ResumeDto, schema: resumeSchema },
  'POST /api/orders/:param/observations': { spec: OBSERVATION, dto: CreateObservationDto, schema: createObservationSchema },
  'PUT /api/patients/:param/spo2-scale': { spec: SPO2_SCALE, dto: Spo2ScaleDto, schema: spo2ScaleRequestSchema },
  'POST /api/flags/:param/acknowledge': { spec: ACKNOWLEDGE_FLAG, dto: AcknowledgeFlagDto, schema: acknowledgeFlagSchema },
  'POST /api/wards/:param/handover/signoffs': { spec: SIGNOFF, dto: CreateSignoffDto, schema: createSignoffSchema },
  'POST /api/auth/login': { spec: LOGIN, dto: LoginDto, schema: loginSchema },
  'POST /api/users': { spec: CREATE_USER, dto: CreateUserDto, schema: createUserSchema },
  'PATCH /api/users/:param': { spec: UPDATE_USER, dto: UpdateUserDto, schema: updateUserSchema },
  'PATCH /api/wards/:param/policy': { spec: WARD_CONTACTS, dto: UpdateWardContactsDto, schema: updateWardContactsSchema },
  'POST /api/wards/:param/policy-changes': {
    spec: PROPOSE_WARD_POLICY_CHANGE,
    dto: ProposeWardPolicyChangeDto,
    schema: proposeWardPolicyChangeSchema,
  },
  'POST /api/wards/policy-changes/:param/sign-off': { spec: SIGNED, dto: SignedRequestDto, schema: signOffWardPolicyChangeSchema },
  'POST /api/wards/policy-changes/:param/decline': {
    spec: DECLINE_WARD_POLICY_CHANGE,
    dto: DeclineWardPolicyChangeDto,
    schema: declineWardPolicyChangeSchema,
  },
  'POST /api/library/versions': { spec: CREATE_DRAFT, dto: CreateDraftDto, schema: createDraftSchema },
  'PUT /api/library/versions/:param/rules': { spec: REPLACE_RULES, dto: ReplaceRulesDto, schema: replaceRulesSchema },
  'POST /api/library/versions/:param/submit': { spec: SUBMIT_VERSION, dto: SubmitVersionDto, schema: submitVersionSchema },
  'POST /api/library/versions/:param/approve': { spec: APPROVE_VERSION, dto: ApproveVersionDto, schema: approveVersionSchema },
  'PUT /api/equianalgesic-factors/:param/:param': {
    spec: EQUIANALGESIC_FACTOR,
    dto: UpdateEquianalgesicFactorDto,
    schema: updateEquianalgesicFactorSchema,
  },
  'POST /api/library/versions/:param/send-back': { spec: SEND_BACK_VERSION, dto: SendBackVersionDto, schema: sendBackVersionSchema },
  'POST /api/patients/:param/allergies': { spec: ADD_ALLERGY, dto: AddAllergyDto, schema: addAllergySchema },
  'PUT /api/patients/:param/opioid-tolerance': { spec: OPIOID_TOLERANCE, dto: OpioidToleranceDto, schema: opioidToleranceSchema },
  'POST /api/patients/:param/weights': { spec: RECORD_WEIGHT, dto: RecordWeightDto, schema: recordWeightSchema },
  // Multipart: the text fields are checked here, the file by multer and the CSV reader.
  'POST /api/library/import': { spec: IMPORT_FIELDS, dto: ImportLibraryDto, schema: importLibraryFieldsSchema },
};

const ROUTES_WITH_BODIES = Object.entries(BAD_INPUT_COVERAGE)
  .filter(([, where]) => where !== 'no body')
  .map(([route]) => route);

/** Seeded, so a failure names a body that fails again. */
const SEED = 20_261_203;
const BAD_PER_ROUTE = Number(process.env.PARITY_BAD_BODIES ?? 300);
const VALID_PER_ROUTE = Number(process.env.PARITY_VALID_BODIES ?? 150);

type Verdict = { accepted: boolean; errors: FieldError[] };

const pipe = createValidationPipe();

async function serverVerdict(dto: Type, json: string): Promise<Verdict> {
  try {
    await pipe.transform(JSON.parse(json), { type: 'body', metatype: dto, data: '' });
    return { accepted: true, errors: [] };
  } catch (error) {
    if (!(error instanceof BadRequestException)) throw error;
    return { accepted: false, errors: (error.getResponse() as { errors: FieldError[] }).errors };
  }
}

function sharedVerdict(schema: z.ZodType, json: string): Verdict {
  const result = schema.safeParse(JSON.parse(json));
  return result.success ? { accepted: true, errors: [] } : { accepted: false, errors: requestFieldErrors(result.error) };
}

/** Keys on Object.prototype (`__proto__`, `constructor`) that the pipe may drop and zod names: either may do so. */
const described = (errors: FieldError[], loose: string[]) =>
  errors
    .filter(({ field }) => !loose.some((key) => related(field, key)))
    .map(({ field, message }) => `${field}: ${message}`)
    .sort();

/** What differs between the two verdicts on one body, or null when they agree. */
async function drift({ dto, schema }: Contract, json: string, loose: string[] = []): Promise<string | null> {
  const [server, shared] = [await serverVerdict(dto, json), sharedVerdict(schema, json)];
  const serverSays = described(server.errors, loose);
  const sharedSays = described(shared.errors, loose);
  if (server.accepted === shared.accepted && JSON.stringify(serverSays) === JSON.stringify(sharedSays)) return null;
  const verdict = (v: Verdict, says: string[]) => (v.accepted ? 'accepts' : `refuses: ${says.join(' | ') || '(only loose keys)'}`);
  return `${json.length > 400 ? `${json.slice(0, 400)}…` : json}\n    server ${verdict(server, serverSays)}\n    shared ${verdict(shared, sharedSays)}`;
}

/** Multipart sends text: the same bodies with numbers and booleans as the form writes them. */
const asForm = (body: Record<string, unknown>) =>
  Object.fromEntries(
    Object.entries(body).map(([key, value]) => [key, typeof value === 'number' || typeof value === 'boolean' ? String(value) : value]),
  );

function validInputs(route: string, spec: BodySpec): string[] {
  const bodies = fc.sample(validBodies(spec), { seed: SEED, numRuns: VALID_PER_ROUTE });
  const forms = route === 'POST /api/library/import' ? bodies.map(asForm) : [];
  return [...bodies, ...forms].map(toJson);
}

function badInputs(spec: BodySpec): BadBody[] {
  return fc.sample(
    validBodies(spec).chain((valid) => badBodies(spec, valid)),
    { seed: SEED, numRuns: BAD_PER_ROUTE },
  );
}

const report = (problems: string[]) =>
  `${problems.length} drifts, the first ${Math.min(problems.length, 8)}:\n  ${problems.slice(0, 8).join('\n  ')}`;

describe('request contracts: shared schema and server DTO agree', () => {
  it('has a contract for every write route with a body', () => {
    expect(Object.keys(CONTRACTS).sort()).toEqual([...ROUTES_WITH_BODIES].sort());
  });

  it.each(ROUTES_WITH_BODIES)('%s: both accept every generated valid body', { timeout: 120_000 }, async (route) => {
    const contract = CONTRACTS[route];
    const problems: string[] = [];
    const inputs = validInputs(route, contract.spec);
    for (const json of inputs) {
      const [server, shared] = [await serverVerdict(contract.dto, json), sharedVerdict(contract.schema, json)];
      if (!server.accepted || !shared.accepted) problems.push((await drift(contract, json)) ?? `both refuse ${json.slice(0, 400)}`);
    }
    expect(problems, report(problems)).toEqual([]);
    expect(inputs.length).toBeGreaterThanOrEqual(VALID_PER_ROUTE);
  });

  it.each(ROUTES_WITH_BODIES)(
    '%s: generated bad bodies get the same verdict and the same field errors',
    { timeout: 120_000 },
    async (route) => {
      const contract = CONTRACTS[route];
      const problems: string[] = [];
      for (const bad of badInputs(contract.spec)) {
        const problem = await drift(contract, bad.json, bad.extraKeys);
        if (problem) problems.push(`${bad.kinds.join(' + ')} at ${bad.broken.join(', ')}: ${problem}`);
      }
      expect(problems, report(problems)).toEqual([]);
    },
  );
});

/** Text made of the pieces dates are made of, so that near misses are common. */
const dateLike = fc.oneof(
  fc.stringMatching(/^[0-9]{4}-[0-9]{2}-[0-9]{2}([Tt ][0-9]{2}:[0-9]{2}(:[0-9]{2}([.,][0-9]{1,4})?)?([Zz]|[+-][0-9]{2}:?[0-9]{2})?)?$/),
  fc.string({ unit: fc.constantFrom(...'0123456789-:TtZzW+., '), maxLength: 30 }),
  fc.constantFrom(
    '2030-02-29',
    '2032-02-29',
    '2100-02-29',
    '2000-02-29',
    '2030-04-31',
    '2030-01-01T24:00:00Z',
    '2030-01-01T23:59:60Z',
    '0999-01-01',
  ),
);

describe('the shared rules agree with class-validator', () => {
  it('a moment: @IsRFC3339 and @IsISO8601({ strict: true })', () => {
    fc.assert(
      fc.property(dateLike, (text) => isMoment(text) === (isRFC3339(text) && isISO8601(text, { strict: true }))),
      { seed: SEED, numRuns: 5000 },
    );
  });

  it('a day: yyyy-mm-dd and @IsISO8601({ strict: true })', () => {
    fc.assert(
      fc.property(dateLike, (text) => isCalendarDay(text) === (/^\d{4}-\d{2}-\d{2}$/.test(text) && isISO8601(text, { strict: true }))),
      { seed: SEED, numRuns: 5000 },
    );
  });

  it('an e-mail address: @IsEmail()', () => {
    const addressLike = fc.oneof(
      fc.emailAddress(),
      fc.string({ unit: fc.constantFrom(...'ab1.-_@"\\ +éü漢'), maxLength: 40 }),
      fc.tuple(fc.string({ maxLength: 70 }), fc.domain()).map(([local, domain]) => `${local}@${domain}`),
    );
    fc.assert(
      fc.property(addressLike, (text) => isEmailAddress(text) === isEmail(text)),
      { seed: SEED, numRuns: 5000 },
    );
  });

  it('a length: @MinLength and @MaxLength count an emoji or a character and its variation selector as one', () => {
    const someText = fc.string({
      unit: fc.oneof(fc.constantFrom('a', ' ', '😀', '\uFE0F', '\uFE0E', '❤'), fc.string({ unit: 'binary', maxLength: 1 })),
      maxLength: 20,
    });
    fc.assert(
      fc.property(
        someText,
        (text) => length(text, textLength(text), textLength(text)) && (textLength(text) === 0 || !length(text, textLength(text) + 1)),
      ),
      { seed: SEED, numRuns: 5000 },
    );
  });
});
