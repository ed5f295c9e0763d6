import { createRequire } from 'node:module';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { ORDER, ROSA, SETTINGS } from './support/pca.js';
import { activeOrder } from './support/pca-steps.js';
import { createTestApp, DEMO_USER_BY_ROLE, PATIENT_1, type TestApp } from './support/test-app.js';

// The typed slices of the two outside checkers. Both ship CommonJS without the types used here.
type FhirValidation = { valid: boolean; messages: { location?: string; severity?: string; message?: string }[] };
type FhirLibrary = { Fhir: new () => { validate(resource: object, options: { errorOnUnexpected: boolean }): FhirValidation } };
type UcumUtils = { validateUnitString(unit: string): { status: string; ucumCode: string | null } };
type ValueSets = Record<string, { systems: { codes: { code: string }[] }[] }>;

const require = createRequire(import.meta.url);
const fhir = new (require('fhir') as FhirLibrary).Fhir();
// @lhncbc/ucum-lhc is the shared package's dev dependency, found here through the workspace's hoisting.
const ucum = (require('@lhncbc/ucum-lhc') as { UcumLhcUtils: { getInstance(): UcumUtils } }).UcumLhcUtils.getInstance();
// The validator does not check Timing's periodUnit against its value set, so this test does.
const UNITS_OF_TIME = (require('fhir/profiles/valuesets.json') as ValueSets)['http://hl7.org/fhir/ValueSet/units-of-time'].systems.flatMap(
  (system) => system.codes.map(({ code }) => code),
);

const UCUM = 'http://unitsofmeasure.org';
const FHIR_JSON = /^application\/fhir\+json/;
type Role = keyof typeof DEMO_USER_BY_ROLE;
type Resource = { resourceType: string } & Record<string, unknown>;

// A worked example on patient 1 (support/pca.ts). Morphine 1 mg/mL, demand 1 mg, lockout 10
// minutes: a common starting regimen [practice; inside the ranges of Grass JA, Anesth Analg 2005;101(5S):S44-S61, from memory]; 4-hour limit 30 mg: the typical
// ranges of a widely used clinical reference table [practice]. Loading dose, basal rate,
// 1-hour limit and clinician bolus are invented for the example (inside the demo library's soft
// limits): the mapping does not depend on their clinical values.
const WORKED = {
  ...ORDER,
  loadingDose: 2,
  basalRatePerHour: 0.5,
  oneHourLimit: 8,
  fourHourLimit: 30,
  clinicianBolusDose: 2,
  indication: 'Pain after laparotomy',
  // A basal rate for this opioid-naive adult needs the prescriber's reason (Chou R et al.,
  // Management of Postoperative Pain, APS/ASRA/ASA guideline, J Pain 2016;17(2):131-157).
  overrides: [{ field: 'basalRatePerHour', reason: 'Basal rate agreed with the acute pain team for this example' }],
};
const WORKED_SETTINGS = { ...SETTINGS, loadingDose: 2, basalRatePerHour: 0.5, oneHourLimit: 8, fourHourLimit: 30 };

describe('FHIR R4 export', () => {
  let t: TestApp;
  const tokens = {} as Record<Role, string>;
  const as = (role: Role) => ({ Authorization: `Bearer ${tokens[role]}` });
  const pcaTokens = () => ({ prescriber: tokens.prescriber, pharmacist: tokens.pharmacist, nurse: tokens.nurse });
  const ids = {} as Record<
    'worked' | 'returned' | 'superseded' | 'revision' | 'rejected' | 'cancelled' | 'discontinued' | 'verified',
    number
  >;
  let patientWithoutOrders: number;
  const validated = { resources: 0, unitCodes: new Set<string>(), unitChecks: 0 };

  const getFhir = (path: string, role: Role = 'nurse') => request(t.http).get(`/api/fhir/${path}`).set(as(role));

  /** Validates with the `fhir` package and every UCUM code and time unit inside, and counts them. */
  function expectValidFhir(resource: Resource): void {
    const result = fhir.validate(resource, { errorOnUnexpected: true });
    expect(
      result.messages.filter((message) => message.severity !== 'info'),
      `${resource.resourceType} ${String(resource.id ?? '')}`,
    ).toEqual([]);
    expect(result.valid).toBe(true);
    validated.resources += 1;
    walk(resource, (node) => {
      if (node.system === UCUM && typeof node.code === 'string') {
        // Source: UCUM, via the npm package @lhncbc/ucum-lhc [lib].
        expect(ucum.validateUnitString(node.code), node.code).toMatchObject({ status: 'valid', ucumCode: node.code });
        validated.unitCodes.add(node.code);
        validated.unitChecks += 1;
      }
      // Source: FHIR R4 value set units-of-time (as the `fhir` package ships it).
      if (typeof node.periodUnit === 'string') expect(UNITS_OF_TIME).toContain(node.periodUnit);
    });
  }

  beforeAll(async () => {
    t = await createTestApp();
    for (const role of Object.keys(DEMO_USER_BY_ROLE) as Role[]) tokens[role] = await t.tokenFor(DEMO_USER_BY_ROLE[role]);

    // One order in every Lockstep status. Demo orders: 1 awaiting verification, 2 verified, 3 returned.
    // Patient 1 gets the returned, rejected, cancelled, discontinued and active ones, in the order a
    // ward could write them: a patient may have only one open PCA, so each is finished (or, for
    // demo order 1, returned) before the next is signed, and the worked example runs last.
    ids.verified = 2;
    const { body: returned } = await request(t.http).get('/api/orders/3').set(as('prescriber')).expect(200);
    const revision = {
      ...ORDER,
      patientId: returned.patientId,
      drugId: returned.drugId,
      doseUnit: 'mcg',
      concentrationPerMl: 10,
      demandDose: 20,
      lockoutMinutes: 8,
      // 20 mcg every 8 minutes could give 160 mcg an hour, over the demo rule's 150 mcg hard maximum.
      oneHourLimit: 100,
      fourHourLimit: 300,
      clinicianBolusDose: null,
    };
    ids.superseded = 3;
    ids.revision = (await request(t.http).post('/api/orders/3/revise').set(as('prescriber')).send(revision).expect(201)).body.id;
    ids.returned = 1;
    await request(t.http)
      .post('/api/orders/1/return')
      .set(as('pharmacist'))
      .send({ reason: 'Please confirm the 4-hour limit' })
      .expect(200);
    ids.rejected = (await request(t.http).post('/api/orders').set(as('prescriber')).send(ORDER).expect(201)).body.id;
    await request(t.http)
      .post(`/api/orders/${ids.rejected}/reject`)
      .set(as('pharmacist'))
      .send({ reason: 'Duplicate of an active PCA' })
      .expect(200);
    ids.cancelled = (await request(t.http).post('/api/orders').set(as('prescriber')).send(ORDER).expect(201)).body.id;
    await request(t.http)
      .post(`/api/orders/${ids.cancelled}/cancel`)
      .set(as('prescriber'))
      .send({ reason: 'Written for the wrong patient' })
      .expect(200);
    ids.discontinued = (await activeOrder(t.http, pcaTokens(), PATIENT_1)).id;
    await request(t.http)
      .post(`/api/orders/${ids.discontinued}/discontinue`)
      .set(as('nurse'))
      .send({ reason: 'Pain controlled on oral analgesia', volumeInfusedMl: 10, wastedMl: 40, witness: ROSA })
      .expect(200);
    ids.worked = (await activeOrder(t.http, pcaTokens(), PATIENT_1, WORKED, WORKED_SETTINGS)).id;

    const { body: orders } = await request(t.http).get('/api/orders').set(as('admin')).expect(200);
    const { body: patients } = await request(t.http).get('/api/patients').set(as('admin')).expect(200);
    const withOrders = new Set((orders as { patientId: number }[]).map((order) => order.patientId));
    patientWithoutOrders = (patients as { id: number }[]).find((patient) => !withOrders.has(patient.id))!.id;
  });

  afterAll(async () => {
    console.log(
      `FHIR export: ${validated.resources} resources validated with the fhir package, ${validated.unitChecks} UCUM codes checked (${[...validated.unitCodes].sort().join(', ')})`,
    );
    await t.close();
  });

  it('answers a MedicationRequest as application/fhir+json', async () => {
    const response = await getFhir(`MedicationRequest/${ids.worked}`).expect(200);
    expect(response.headers['content-type']).toMatch(FHIR_JSON);
    expect(response.body).toMatchObject({ resourceType: 'MedicationRequest', id: String(ids.worked) });
  });

  it('maps the worked example to the expected values', async () => {
    const { body: order } = await request(t.http).get(`/api/orders/${ids.worked}`).set(as('nurse')).expect(200);
    const { body } = await getFhir(`MedicationRequest/${ids.worked}`).expect(200);
    const mg = (value: number) => ({ value, unit: 'mg', system: UCUM, code: 'mg' });
    const hours = (value: number) => ({ value, unit: 'h', system: UCUM, code: 'h' });
    // Element names and codes: HL7 FHIR R4 (4.0.1) MedicationRequest, Medication and Dosage;
    // medicationrequest-status "active" = actionable, not all actions done; units: UCUM.
    expect(body).toEqual({
      resourceType: 'MedicationRequest',
      id: String(ids.worked),
      contained: [
        {
          resourceType: 'Medication',
          id: 'medication',
          code: { text: 'morphine' },
          ingredient: [
            {
              itemCodeableConcept: { text: 'morphine' },
              isActive: true,
              strength: { numerator: mg(1), denominator: { value: 1, unit: 'mL', system: UCUM, code: 'mL' } },
            },
          ],
        },
      ],
      identifier: [{ system: 'https://lockstep.example/fhir/sid/pca-order', value: String(ids.worked) }],
      status: 'active',
      intent: 'order',
      category: [
        {
          coding: [{ system: 'http://terminology.hl7.org/CodeSystem/medicationrequest-category', code: 'inpatient', display: 'Inpatient' }],
        },
      ],
      medicationReference: { reference: '#medication', display: 'morphine 1 mg/mL' },
      subject: {
        type: 'Patient',
        identifier: {
          type: { coding: [{ system: 'http://terminology.hl7.org/CodeSystem/v2-0203', code: 'MR' }], text: 'MRN' },
          system: 'https://lockstep.example/fhir/sid/mrn',
          value: 'KB100231',
        },
        display: 'ACHTERBERG, Noah',
      },
      authoredOn: order.signedAt,
      requester: {
        type: 'Practitioner',
        identifier: { system: 'https://lockstep.example/fhir/sid/user', value: String(order.prescriberId) },
        display: 'Dr Amara Osei',
      },
      reasonCode: [{ text: 'Pain after laparotomy' }],
      note: [{ text: 'Review by 2030-01-02' }],
      dosageInstruction: [
        {
          sequence: 1,
          text: 'Loading dose 2 mg intravenously, once, before the PCA starts',
          timing: { repeat: { count: 1 } },
          route: { text: 'Intravenous' },
          method: { text: 'Loading dose' },
          doseAndRate: [{ doseQuantity: mg(2) }],
        },
        {
          extension: [
            {
              url: 'https://lockstep.example/fhir/StructureDefinition/pca-lockout-interval',
              valueDuration: { value: 10, unit: 'min', system: UCUM, code: 'min' },
            },
          ],
          sequence: 2,
          text: 'Demand dose 1 mg intravenously when the patient presses the button; lockout 10 min',
          timing: { repeat: { frequency: 1, period: 10, periodUnit: 'min' } },
          asNeededBoolean: true,
          route: { text: 'Intravenous' },
          method: { text: 'Patient-controlled demand dose' },
          doseAndRate: [{ doseQuantity: mg(1) }],
        },
        {
          sequence: 2,
          text: 'Basal rate 0.5 mg/h intravenously, continuous',
          route: { text: 'Intravenous' },
          method: { text: 'Continuous infusion' },
          doseAndRate: [{ rateQuantity: { value: 0.5, unit: 'mg/h', system: UCUM, code: 'mg/h' } }],
        },
        {
          sequence: 2,
          text: '1-hour limit: at most 8 mg in any hour, demand doses and basal rate together',
          maxDosePerPeriod: { numerator: mg(8), denominator: hours(1) },
        },
        {
          sequence: 2,
          text: '4-hour limit: at most 30 mg in any 4 hours, demand doses and basal rate together',
          maxDosePerPeriod: { numerator: mg(30), denominator: hours(4) },
        },
        {
          sequence: 2,
          text: "Clinician bolus 2 mg intravenously as needed for breakthrough pain, given by a nurse with a second nurse's check",
          asNeededCodeableConcept: { text: 'Breakthrough pain' },
          route: { text: 'Intravenous' },
          method: { text: 'Clinician bolus' },
          doseAndRate: [{ doseQuantity: mg(2) }],
        },
      ],
    });
    expectValidFhir(body);
  });

  it('maps every Lockstep status to its FHIR status, keeps the reason and links a revision to the order it replaces', async () => {
    // Source: HL7 FHIR R4 (4.0.1) code system medicationrequest-status (definitions quoted in
    // shared/src/fhir/order-status-to-fhir.ts).
    const expected: Record<keyof typeof ids, [string, string, string | undefined]> = {
      returned: ['returned', 'draft', 'Please confirm the 4-hour limit'],
      verified: ['verified', 'active', undefined],
      worked: ['active', 'active', undefined],
      superseded: ['superseded', 'cancelled', `Revised as order ${ids.revision}`],
      revision: ['awaiting_verification', 'draft', undefined],
      rejected: ['rejected', 'cancelled', 'Duplicate of an active PCA'],
      cancelled: ['cancelled', 'cancelled', 'Written for the wrong patient'],
      discontinued: ['discontinued', 'stopped', 'Pain controlled on oral analgesia'],
    };
    for (const [name, [lockstep, status, reason]] of Object.entries(expected)) {
      const id = ids[name as keyof typeof ids];
      const { body: order } = await request(t.http).get(`/api/orders/${id}`).set(as('nurse')).expect(200);
      expect(order.status, name).toBe(lockstep);
      const { body } = await getFhir(`MedicationRequest/${id}`).expect(200);
      expect(body, name).toMatchObject({ status, intent: 'order' });
      expect(body.statusReason?.text, name).toBe(reason);
      expectValidFhir(body);
    }
    const { body: revision } = await getFhir(`MedicationRequest/${ids.revision}`).expect(200);
    expect(revision.priorPrescription).toEqual({ reference: `MedicationRequest/${ids.superseded}` });
    expect(revision.dosageInstruction[0].doseAndRate).toEqual([{ doseQuantity: { value: 20, unit: 'mcg', system: UCUM, code: 'ug' } }]);
  });

  it('validates every order there is, and every patient’s bundle', async () => {
    const { body: orders } = await request(t.http).get('/api/orders').set(as('admin')).expect(200);
    expect(orders.length).toBeGreaterThanOrEqual(Object.keys(ids).length);
    for (const order of orders as { id: number }[]) expectValidFhir((await getFhir(`MedicationRequest/${order.id}`).expect(200)).body);
    const { body: patients } = await request(t.http).get('/api/patients').set(as('admin')).expect(200);
    for (const patient of patients as { id: number }[]) {
      const response = await getFhir(`Patient/${patient.id}/pca-bundle`).expect(200);
      expect(response.headers['content-type']).toMatch(FHIR_JSON);
      expectValidFhir(response.body);
    }
  });

  it('bundles a patient’s orders in every status, oldest first, each with its absolute URL', async () => {
    const { body: order } = await request(t.http).get(`/api/orders/${ids.worked}`).set(as('nurse')).expect(200);
    const response = await getFhir(`Patient/${order.patientId}/pca-bundle`).expect(200);
    const base = `http://${response.request.url.split('/')[2]}/api/fhir`;
    expect(response.body).toMatchObject({ resourceType: 'Bundle', type: 'collection', timestamp: expect.any(String) });
    expect(response.body).not.toHaveProperty('total');
    const entries = response.body.entry as { fullUrl: string; resource: { id: string; status: string } }[];
    const entryIds = entries.map((entry) => Number(entry.resource.id));
    expect(entryIds).toEqual([...entryIds].sort((a, b) => a - b));
    for (const id of [ids.returned, ids.worked, ids.rejected, ids.cancelled, ids.discontinued]) expect(entryIds).toContain(id);
    for (const entry of entries) expect(entry.fullUrl).toBe(`${base}/MedicationRequest/${entry.resource.id}`);
    const worked = entries.find((entry) => entry.resource.id === String(ids.worked));
    expect(worked?.resource).toEqual((await getFhir(`MedicationRequest/${ids.worked}`).expect(200)).body);
  });

  it('answers a patient without PCA orders with a bundle without entries', async () => {
    const { body } = await getFhir(`Patient/${patientWithoutOrders}/pca-bundle`).expect(200);
    expect(body).toEqual({ resourceType: 'Bundle', type: 'collection', timestamp: expect.any(String) });
    expectValidFhir(body);
  });

  it.each(Object.keys(DEMO_USER_BY_ROLE) as Role[])('lets a %s read both', async (role) => {
    await getFhir(`MedicationRequest/${ids.worked}`, role).expect(200);
    await getFhir('Patient/1/pca-bundle', role).expect(200);
  });

  // Source: HL7 FHIR R4 (4.0.1), OperationOutcome and the issue-type code system.
  it('answers errors as an OperationOutcome: anonymous 401, unknown order or patient 404, a bad id 400', async () => {
    const cases = [
      [request(t.http).get(`/api/fhir/MedicationRequest/${ids.worked}`), 401, 'login'],
      [request(t.http).get('/api/fhir/Patient/1/pca-bundle'), 401, 'login'],
      [getFhir('MedicationRequest/999999'), 404, 'not-found'],
      [getFhir('Patient/999999/pca-bundle'), 404, 'not-found'],
      [getFhir('MedicationRequest/abc'), 400, 'invalid'],
      [getFhir('Patient/0/pca-bundle'), 400, 'invalid'],
    ] as const;
    for (const [call, status, code] of cases) {
      const response = await call.expect(status);
      expect(response.headers['content-type']).toMatch(FHIR_JSON);
      expect(response.body).toEqual({
        resourceType: 'OperationOutcome',
        issue: [{ severity: 'error', code, diagnostics: expect.any(String) }],
      });
      expectValidFhir(response.body);
    }
    expect((await getFhir('MedicationRequest/999999')).body.issue[0].diagnostics).toBe('No order with id 999999');
  });

  it('writes nothing: a read leaves the audit trail as it was', async () => {
    const before = (await request(t.http).get('/api/audit?limit=1').set(as('admin')).expect(200)).body.total;
    await getFhir(`MedicationRequest/${ids.worked}`).expect(200);
    await getFhir('Patient/1/pca-bundle').expect(200);
    expect((await request(t.http).get('/api/audit?limit=1').set(as('admin')).expect(200)).body.total).toBe(before);
  });

  it('uses a validator that refuses what R4 refuses (a Lockstep status, an unknown element, a bad unit)', async () => {
    const { body } = await getFhir(`MedicationRequest/${ids.worked}`).expect(200);
    const broken = { ...body, status: 'superseded', pumpSettings: {}, contained: [{ ...body.contained[0], strength: 1 }] };
    const messages = fhir.validate(broken, { errorOnUnexpected: true }).messages.map((message) => message.location);
    expect(messages).toEqual(expect.arrayContaining(['MedicationRequest.status', 'MedicationRequest.pumpSettings', 'Medication.strength']));
    expect(ucum.validateUnitString('mcg').status).not.toBe('valid');
  });

  it('checked every UCUM code the export uses', () => {
    // Source: UCUM, via the npm package @lhncbc/ucum-lhc [lib]: mcg is exchanged as ug, and never sent as a code.
    expect([...validated.unitCodes].sort()).toEqual(['h', 'mL', 'mg', 'mg/h', 'min', 'ug']);
  });
});

/** Calls `visit` on every object in the tree. */
function walk(value: unknown, visit: (node: Record<string, unknown>) => void): void {
  if (Array.isArray(value)) for (const item of value) walk(item, visit);
  else if (value && typeof value === 'object') {
    visit(value as Record<string, unknown>);
    for (const child of Object.values(value)) walk(child, visit);
  }
}
