import 'reflect-metadata';
import request from 'supertest';
import { describe, expect, it } from 'vitest';
import type { AuditPage, Finding, OrderPreview, Patient } from '@lockstep/shared';
import { AddAllergyDto, OpioidToleranceDto, RecordWeightDto, Spo2ScaleDto } from '../src/patients/dto/patient-record.dto.js';
import { type BadInputApp, badInputSuite, type BadInputRoute } from './support/bad-input-harness.js';
import { ADD_ALLERGY, OPIOID_TOLERANCE, RECORD_WEIGHT, SPO2_SCALE } from './support/bad-input-specs.js';
import { ORDER, REGIMEN } from './support/pca.js';

// The patient record: allergies as entries (and the order check that reads them), opioid tolerance
// with its basis, the weight with the day it was measured. Demo data: patient 1 (ACHTERBERG) has
// "no known allergies"; patient 2 (VALDIVIA) a penicillin allergy; drug 1 is morphine.

const today = () => new Date().toISOString().slice(0, 10);
const state = { patientId: 0 };

async function setUp({ t }: BadInputApp): Promise<void> {
  state.patientId = (await t.addPatient()).id;
}

const ROUTES: BadInputRoute[] = [
  {
    method: 'POST',
    path: '/api/patients/:id/allergies',
    url: () => `/api/patients/${state.patientId}/allergies`,
    role: 'prescriber',
    spec: ADD_ALLERGY,
    dto: AddAllergyDto,
    valid: () => ({ drugId: null, substance: 'Chlorhexidine', reaction: 'hives', severity: 'allergy' }),
  },
  {
    method: 'PUT',
    path: '/api/patients/:id/opioid-tolerance',
    url: () => `/api/patients/${state.patientId}/opioid-tolerance`,
    role: 'pharmacist',
    spec: OPIOID_TOLERANCE,
    dto: OpioidToleranceDto,
    valid: () => ({ opioidTolerant: true, oralMorphineMgPerDay: 90, days: 14 }),
  },
  {
    method: 'PUT',
    path: '/api/patients/:id/spo2-scale',
    url: () => `/api/patients/${state.patientId}/spo2-scale`,
    role: 'prescriber',
    spec: SPO2_SCALE,
    dto: Spo2ScaleDto,
    valid: () => ({ spo2Scale: '1' }),
  },
  {
    method: 'POST',
    path: '/api/patients/:id/weights',
    url: () => `/api/patients/${state.patientId}/weights`,
    role: 'nurse',
    spec: RECORD_WEIGHT,
    dto: RecordWeightDto,
    valid: () => ({ weightKg: 71.5, measuredOn: '2026-01-02' }),
  },
];

describe('the patient record', () => {
  const suite = badInputSuite('patients', ROUTES, setUp);
  const as = (role: string) => ({ Authorization: `Bearer ${suite.tokens[role as keyof typeof suite.tokens]}` });
  const http = () => suite.t.http;
  const newPatient = async () => (await suite.t.addPatient()).id;
  const addAllergy = (patientId: number, body: object, role = 'prescriber') =>
    request(http()).post(`/api/patients/${patientId}/allergies`).set(as(role)).send(body);
  const preview = async (patientId: number) =>
    (
      await request(http())
        .post('/api/orders/preview')
        .set(as('prescriber'))
        .send({ ...REGIMEN, patientId })
        .expect(200)
    ).body as OrderPreview;
  const allergyFindingsOf = (findings: Finding[]) => findings.filter((finding) => finding.code.startsWith('allergy.'));
  const latestPatientEvent = async (patientId: number) =>
    (
      (await request(http()).get(`/api/audit?entityType=patient&entityId=${patientId}&limit=1`).set(as('admin')).expect(200))
        .body as AuditPage
    ).events[0];

  describe('allergies', () => {
    it('answers every patient with the list of entries and whether "no known allergies" was recorded', async () => {
      const noah = (await request(http()).get('/api/patients/1').set(as('nurse')).expect(200)).body as Patient;
      expect(noah).toMatchObject({ allergies: [], noKnownAllergies: true });
      const ines = (await request(http()).get('/api/patients/2').set(as('nurse')).expect(200)).body as Patient;
      expect(ines.noKnownAllergies).toBe(false);
      expect(ines.allergies).toEqual([
        expect.objectContaining({ drugId: null, substance: 'Penicillin', reaction: 'rash', severity: 'allergy' }),
      ]);
    });

    it('records an entry for a formulary drug under the drug’s name, with who recorded it, and clears "no known allergies"', async () => {
      const patientId = await newPatient();
      await request(http()).post(`/api/patients/${patientId}/no-known-allergies`).set(as('prescriber')).expect(200);
      const answer = (await addAllergy(patientId, { drugId: 1, substance: 'MST', reaction: 'itch', severity: 'intolerance' }).expect(201))
        .body as Patient;
      expect(answer.noKnownAllergies).toBe(false);
      expect(answer.allergies).toEqual([
        expect.objectContaining({
          drugId: 1,
          substance: 'morphine',
          reaction: 'itch',
          severity: 'intolerance',
          recordedByName: 'Dr Amara Osei',
        }),
      ]);
      const event = await latestPatientEvent(patientId);
      expect(event).toMatchObject({ action: 'patient.allergy-add', entityType: 'patient', entityId: String(patientId) });
      expect(event.summary).toMatchObject({
        drugId: 1,
        substance: 'morphine',
        severity: 'intolerance',
        noKnownAllergies: { from: true, to: false },
      });
    });

    it('refuses an unknown drug and a substance already recorded, naming the field; and "no known allergies" while entries exist (409)', async () => {
      const patientId = await newPatient();
      const unknown = await addAllergy(patientId, { drugId: 999, substance: 'x', reaction: 'rash', severity: 'allergy' }).expect(400);
      expect(unknown.body.errors).toEqual([{ field: 'drugId', message: 'No drug with id 999' }]);
      await addAllergy(patientId, { substance: 'Latex', reaction: 'hives', severity: 'allergy' }).expect(201);
      const again = await addAllergy(patientId, { substance: 'latex', reaction: 'wheeze', severity: 'anaphylaxis' }).expect(400);
      expect(again.body.errors[0].field).toBe('substance');
      await request(http()).post(`/api/patients/${patientId}/no-known-allergies`).set(as('pharmacist')).expect(409);
      await addAllergy(999_999, { substance: 'Latex', reaction: 'hives', severity: 'allergy' }).expect(404);
    });

    it('removes an entry (audited with what it said); another patient’s entry id is 404', async () => {
      const patientId = await newPatient();
      const added = (await addAllergy(patientId, { substance: 'Codeine', reaction: 'vomiting', severity: 'intolerance' }).expect(201))
        .body as Patient;
      const entryId = added.allergies[0].id;
      await request(http()).delete(`/api/patients/1/allergies/${entryId}`).set(as('pharmacist')).expect(404);
      const after = (await request(http()).delete(`/api/patients/${patientId}/allergies/${entryId}`).set(as('pharmacist')).expect(200))
        .body as Patient;
      expect(after).toMatchObject({ allergies: [], noKnownAllergies: false });
      expect(await latestPatientEvent(patientId)).toMatchObject({
        action: 'patient.allergy-remove',
        summary: { allergyId: entryId, substance: 'Codeine', reaction: 'vomiting', severity: 'intolerance' },
      });
    });

    it('takes an Idempotency-Key; "no known allergies" sent again records nothing, and a repeated removal is 404', async () => {
      const patientId = await newPatient();
      const key = { 'Idempotency-Key': 'f3c2a6d0-1b2c-4d5e-8f90-123456789abc' };
      const added = (
        await addAllergy(patientId, { substance: 'Plaster', reaction: 'blisters', severity: 'intolerance' }).set(key).expect(201)
      ).body as Patient;
      const remove = () =>
        request(http()).delete(`/api/patients/${patientId}/allergies/${added.allergies[0].id}`).set(as('prescriber')).set(key);
      await remove().expect(200);
      await remove().expect(404);
      // A key is for one request: the same key with another route would be refused (422).
      const noneKnownKey = { 'Idempotency-Key': 'a9d4e1f0-2c3b-4e5f-8a90-fedcba987654' };
      const noneKnown = () => request(http()).post(`/api/patients/${patientId}/no-known-allergies`).set(as('prescriber')).set(noneKnownKey);
      await noneKnown().expect(200);
      const recorded = await latestPatientEvent(patientId);
      expect(recorded.action).toBe('patient.no-known-allergies');
      expect(((await noneKnown().expect(200)).body as Patient).noKnownAllergies).toBe(true);
      expect((await latestPatientEvent(patientId)).id).toBe(recorded.id);
    });

    it('lets prescribers and pharmacists edit allergies, not nurses', async () => {
      const body = { substance: 'Latex', reaction: 'hives', severity: 'allergy' };
      await addAllergy(1, body, 'nurse').expect(403);
      await addAllergy(1, body, 'charge_nurse').expect(403);
      await addAllergy(1, body, 'admin').expect(403);
    });
  });

  describe('the order check reads the allergies', () => {
    it('blocks morphine for a patient with recorded morphine anaphylaxis: the preview shows it and signing is refused', async () => {
      const patientId = await newPatient();
      await addAllergy(patientId, { drugId: 1, substance: 'morphine', reaction: 'throat swelling', severity: 'anaphylaxis' }).expect(201);
      const findings = allergyFindingsOf((await preview(patientId)).findings);
      expect(findings).toEqual([expect.objectContaining({ field: 'drugId', severity: 'hard', code: 'allergy.anaphylaxis' })]);
      expect(findings[0].message).toMatch(/morphine.*anaphylaxis.*throat swelling/);
      const signed = await request(http())
        .post('/api/orders')
        .set(as('prescriber'))
        .send({ ...ORDER, patientId })
        .expect(400);
      expect(signed.body.errors).toContainEqual(expect.objectContaining({ field: 'drugId' }));
    });

    it('finds free text naming the drug too, and asks a reason to sign for a morphine intolerance', async () => {
      const patientId = await newPatient();
      await addAllergy(patientId, { substance: 'Morphine sulfate', reaction: 'nausea', severity: 'intolerance' }).expect(201);
      const { findings } = await preview(patientId);
      expect(allergyFindingsOf(findings)).toEqual([
        expect.objectContaining({ field: 'drugId', severity: 'soft', code: 'allergy.intolerance' }),
      ]);
      const unexplained = await request(http())
        .post('/api/orders')
        .set(as('prescriber'))
        .send({ ...ORDER, patientId })
        .expect(400);
      expect(unexplained.body.errors).toContainEqual(
        expect.objectContaining({ field: 'drugId', message: expect.stringMatching(/^Reason needed/) }),
      );
      const overrides = [...new Set(findings.filter((f) => f.severity === 'soft').map((f) => f.field))].map((field) => ({
        field,
        reason: 'Mild nausea only; antiemetic charted',
      }));
      await request(http())
        .post('/api/orders')
        .set(as('prescriber'))
        .send({ ...ORDER, patientId, overrides })
        .expect(201);
    });

    it('finds nothing for an allergy to another substance', async () => {
      const patientId = await newPatient();
      await addAllergy(patientId, { substance: 'Hydromorphone', reaction: 'rash', severity: 'anaphylaxis' }).expect(201);
      expect(allergyFindingsOf((await preview(patientId)).findings)).toEqual([]);
    });
  });

  describe('opioid tolerance with its basis', () => {
    it('records a tolerance whose basis meets the FDA definition (60 mg oral morphine a day for 7 days), audited', async () => {
      const patientId = await newPatient();
      const body = { opioidTolerant: true, oralMorphineMgPerDay: 60, days: 7 };
      const answer = (await request(http()).put(`/api/patients/${patientId}/opioid-tolerance`).set(as('pharmacist')).send(body).expect(200))
        .body as Patient;
      expect(answer).toMatchObject({ opioidTolerant: true, toleranceOralMorphineMgPerDay: 60, toleranceDays: 7 });
      expect(await latestPatientEvent(patientId)).toMatchObject({
        action: 'patient.tolerance-update',
        summary: { opioidTolerant: { from: false, to: true }, toleranceOralMorphineMgPerDay: { from: null, to: 60 } },
      });
    });

    it('refuses a tolerant claim without a basis that meets it, and a naive one whose basis does, naming the field', async () => {
      const patientId = await newPatient();
      const put = (body: object) => request(http()).put(`/api/patients/${patientId}/opioid-tolerance`).set(as('prescriber')).send(body);
      expect((await put({ opioidTolerant: true, oralMorphineMgPerDay: null, days: null }).expect(400)).body.errors[0].field).toBe(
        'oralMorphineMgPerDay',
      );
      expect((await put({ opioidTolerant: true, oralMorphineMgPerDay: 59, days: 30 }).expect(400)).body.errors[0].field).toBe(
        'oralMorphineMgPerDay',
      );
      expect((await put({ opioidTolerant: true, oralMorphineMgPerDay: 90, days: 6 }).expect(400)).body.errors[0].field).toBe('days');
      expect((await put({ opioidTolerant: false, oralMorphineMgPerDay: 90, days: 10 }).expect(400)).body.errors[0].field).toBe(
        'opioidTolerant',
      );
      // A number too long for a double is infinite once parsed: refused, never "no limit".
      const infinite = await request(http())
        .put(`/api/patients/${patientId}/opioid-tolerance`)
        .set(as('prescriber'))
        .set('Content-Type', 'application/json')
        .send(`{"opioidTolerant":true,"oralMorphineMgPerDay":1${'0'.repeat(400)},"days":10}`)
        .expect(400);
      expect(infinite.body.errors[0].field).toBe('oralMorphineMgPerDay');
      await request(http())
        .put(`/api/patients/${patientId}/opioid-tolerance`)
        .set(as('nurse'))
        .send({ opioidTolerant: false, oralMorphineMgPerDay: null, days: null })
        .expect(403);
    });
  });

  describe('weight with the day it was measured', () => {
    it('records a new weight and its day (nurses and prescribers), audited from and to', async () => {
      const patientId = await newPatient();
      const answer = (
        await request(http())
          .post(`/api/patients/${patientId}/weights`)
          .set(as('nurse'))
          .send({ weightKg: 80.4, measuredOn: today() })
          .expect(201)
      ).body as Patient;
      expect(answer).toMatchObject({ weightKg: 80.4, weightMeasuredOn: today() });
      const event = await latestPatientEvent(patientId);
      expect(event).toMatchObject({ action: 'patient.weight-record', summary: { weightKg: { from: 82, to: 80.4 } } });
      await request(http())
        .post(`/api/patients/${patientId}/weights`)
        .set(as('prescriber'))
        .send({ weightKg: 81, measuredOn: today() })
        .expect(201);
      await request(http())
        .post(`/api/patients/${patientId}/weights`)
        .set(as('pharmacist'))
        .send({ weightKg: 81, measuredOn: today() })
        .expect(403);
    });

    it('records nothing for the same weight and day sent again', async () => {
      const patientId = await newPatient();
      const post = () =>
        request(http())
          .post(`/api/patients/${patientId}/weights`)
          .set(as('nurse'))
          .send({ weightKg: 79.9, measuredOn: today() })
          .expect(201);
      await post();
      const recorded = await latestPatientEvent(patientId);
      await post();
      expect((await latestPatientEvent(patientId)).id).toBe(recorded.id);
    });

    it('refuses a day in the future or before birth, and a weight of 0, infinite or over 500 kg, naming the field', async () => {
      const patientId = await newPatient();
      const post = (body: object) => request(http()).post(`/api/patients/${patientId}/weights`).set(as('nurse')).send(body);
      const future = new Date(Date.now() + 3 * 86_400_000).toISOString().slice(0, 10);
      expect((await post({ weightKg: 80, measuredOn: future }).expect(400)).body.errors).toEqual([
        { field: 'measuredOn', message: 'The weight cannot have been measured in the future' },
      ]);
      expect((await post({ weightKg: 80, measuredOn: '1960-01-01' }).expect(400)).body.errors[0].field).toBe('measuredOn');
      for (const weightKg of ['0', '-1', `1${'0'.repeat(400)}`, '501']) {
        const reply = await request(http())
          .post(`/api/patients/${patientId}/weights`)
          .set(as('nurse'))
          .set('Content-Type', 'application/json')
          .send(`{"weightKg":${weightKg},"measuredOn":"${today()}"}`)
          .expect(400);
        expect(reply.body.errors[0].field, weightKg.slice(0, 8)).toBe('weightKg');
      }
    });
  });
});
