import { describe, expect, it } from 'vitest';
import { ADULT_VITALS_PATIENT, breathingFlags, news2Of, type VitalSigns, type VitalsPatient } from './breathing-flags.js';
import { DEFAULT_WARD_POLICY } from './ward-policy.js';

const calm: VitalSigns = { respiratoryRate: 16, spo2: 97 };
const adult: VitalsPatient = { ageYears: 50, paediatricWard: false, spo2Scale: '1' };
const codes = (vitals: VitalSigns, patient: VitalsPatient = adult, policy = DEFAULT_WARD_POLICY) =>
  breathingFlags(vitals, patient, policy).map((f) => `${f.severity}:${f.code}`);

describe('breathingFlags, adults: NEWS2 bands (Royal College of Physicians, NEWS2, 2017)', () => {
  it('RR ≤ 8 urgent (scores 3); 9–11 review (scores 1); 12 and over nothing', () => {
    expect(codes({ ...calm, respiratoryRate: 8 })).toEqual(['urgent:respiratory-rate.low']);
    expect(codes({ ...calm, respiratoryRate: 9 })).toEqual(['review:respiratory-rate.review']);
    expect(codes({ ...calm, respiratoryRate: 11 })).toEqual(['review:respiratory-rate.review']);
    expect(codes({ ...calm, respiratoryRate: 12 })).toEqual([]);
  });
  it('SpO2 scale 1: ≤ 91 % urgent (3); 92–93 % review (2); 94 % nothing by itself', () => {
    expect(codes({ ...calm, spo2: 91 })).toEqual(['urgent:spo2.low']);
    expect(codes({ ...calm, spo2: 92 })).toEqual(['review:spo2.review']);
    expect(codes({ ...calm, spo2: 93, oxygenLitresPerMinute: 0 })).toEqual(['review:spo2.review']);
    expect(codes({ ...calm, spo2: 94 })).toEqual([]);
  });
  it('SpO2 scale 2, chosen by a prescriber: ≤ 83 % urgent; 84–87 % review; 88 % nothing (RCP NEWS2 Chart 1, 2017)', () => {
    const hypercapnic = { ...adult, spo2Scale: '2' as const };
    expect(codes({ ...calm, spo2: 83 }, hypercapnic)).toEqual(['urgent:spo2.low']);
    expect(codes({ ...calm, spo2: 84 }, hypercapnic)).toEqual(['review:spo2.review']);
    expect(codes({ ...calm, spo2: 87 }, hypercapnic)).toEqual(['review:spo2.review']);
    expect(codes({ ...calm, spo2: 88 }, hypercapnic)).toEqual([]);
  });
  it('a ward policy can only tighten: urgent below 12/min flags 11, and a looser setting still flags 8', () => {
    expect(codes({ ...calm, respiratoryRate: 11 }, adult, { ...DEFAULT_WARD_POLICY, respiratoryRateThreshold: 12 })).toEqual([
      'urgent:respiratory-rate.low',
    ]);
    expect(codes({ ...calm, respiratoryRate: 8 }, adult, { ...DEFAULT_WARD_POLICY, respiratoryRateThreshold: 4 })).toEqual([
      'urgent:respiratory-rate.low',
    ]);
    expect(codes({ ...calm, spo2: 91 }, adult, { ...DEFAULT_WARD_POLICY, spo2Threshold: 70 })).toEqual(['urgent:spo2.low']);
  });
  it('a full set scoring 5 or more, or a single 3, raises an urgent NEWS2 flag; 7 or more an emergency one', () => {
    const full: VitalSigns = {
      ...calm,
      heartRate: 72,
      systolicBp: 125,
      temperatureC: 36.8,
      consciousness: 'alert',
      oxygenLitresPerMinute: 0,
    };
    expect(codes(full)).toEqual([]);
    expect(news2Of(full, adult)?.total).toBe(0);
    expect(codes({ ...full, systolicBp: 90 })).toEqual(['urgent:news2.urgent']);
    expect(codes({ ...full, heartRate: 115, temperatureC: 38.5, oxygenLitresPerMinute: 2 })).toEqual(['urgent:news2.urgent']);
    expect(codes({ ...full, consciousness: 'voice', systolicBp: 95, heartRate: 115 })).toEqual(['urgent:news2.emergency']);
  });
  it('an adult of unknown age gets the adult bands but no NEWS2 score', () => {
    expect(codes({ ...calm, respiratoryRate: 8 }, ADULT_VITALS_PATIENT)).toEqual(['urgent:respiratory-rate.low']);
    expect(
      news2Of({ ...calm, heartRate: 72, systolicBp: 125, temperatureC: 36.8, consciousness: 'alert' }, ADULT_VITALS_PATIENT),
    ).toBeNull();
  });
});

// Children: APLS normal ranges as published in Fleming et al., Normal ranges of heart rate and respiratory rate in
// children from birth to 18 years of age, Lancet 2011;377:1011–1018 (web appendix, Web Box 1); urgent rates from
// memory of APAGBI Good Practice in Postoperative and Procedural Pain Management (2012).
describe('breathingFlags, children: age bands (APLS per Fleming et al. 2011; APAGBI 2012 from memory)', () => {
  const child = (ageYears: number): VitalsPatient => ({ ageYears, paediatricWard: true, spo2Scale: '1' });
  it('a 4-year-old: RR 14 urgent (below 15), RR 20 review (below the normal 25), RR 28 nothing, RR 34 review high', () => {
    expect(codes({ ...calm, respiratoryRate: 14 }, child(4))).toEqual(['urgent:respiratory-rate.low']);
    expect(codes({ ...calm, respiratoryRate: 20 }, child(4))).toEqual(['review:respiratory-rate.review']);
    expect(codes({ ...calm, respiratoryRate: 28 }, child(4))).toEqual([]);
    expect(codes({ ...calm, respiratoryRate: 34 }, child(4))).toEqual(['review:respiratory-rate.high']);
  });
  it('an infant at 22/min is reviewed where an adult would raise nothing', () => {
    expect(codes({ ...calm, respiratoryRate: 22 }, child(0))).toEqual(['review:respiratory-rate.review']);
  });
  it('heart rate outside the normal band is reviewed; no NEWS2 under 16 even with a full set', () => {
    const full: VitalSigns = { ...calm, respiratoryRate: 22, heartRate: 150, systolicBp: 95, temperatureC: 36.8, consciousness: 'alert' };
    expect(codes(full, child(8))).toEqual(['review:heart-rate.high']);
    expect(news2Of(full, { ...adult, ageYears: 15 })).toBeNull();
  });
  it('a 15-year-old on an adult ward still gets the children’s bands', () => {
    expect(codes({ ...calm, respiratoryRate: 12 }, { ageYears: 15, paediatricWard: false, spo2Scale: '1' })).toEqual([
      'review:respiratory-rate.review',
    ]);
  });
});
