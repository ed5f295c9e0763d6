import { describe, expect, it } from 'vitest';
import {
  news2,
  news2ConsciousnessScore,
  news2PulseScore,
  news2RespirationScore,
  news2Response,
  news2Spo2Score,
  news2SystolicScore,
  news2TemperatureScore,
  type News2Input,
} from './news2.js';

// Every expectation below is the chart of the Royal College of Physicians, National Early Warning Score (NEWS) 2,
// 2017, unless marked "from memory".
const table = (fn: (v: number) => number, rows: [number, number][]) => rows.map(([v, score]) => [v, fn(v), score]);

describe('NEWS2 parameter bands (Royal College of Physicians, NEWS2, 2017)', () => {
  it('respiration: ≤8 3; 9–11 1; 12–20 0; 21–24 2; ≥25 3', () => {
    for (const [v, got, want] of table(news2RespirationScore, [
      [0, 3],
      [8, 3],
      [9, 1],
      [11, 1],
      [12, 0],
      [20, 0],
      [21, 2],
      [24, 2],
      [25, 3],
      [60, 3],
    ]))
      expect(got, `RR ${v}`).toBe(want);
  });
  it('SpO2 scale 1: ≤91 3; 92–93 2; 94–95 1; ≥96 0', () => {
    for (const [v, want] of [
      [91, 3],
      [92, 2],
      [93, 2],
      [94, 1],
      [95, 1],
      [96, 0],
      [100, 0],
    ]) {
      expect(news2Spo2Score(v, '1', false), `SpO2 ${v}`).toBe(want);
      expect(news2Spo2Score(v, '1', true), `SpO2 ${v} on oxygen`).toBe(want);
    }
  });
  it('SpO2 scale 2 (RCP NEWS2 Chart 1, 2017): ≤83 3; 84–85 2; 86–87 1; 88–92 0; ≥93 on air 0; on oxygen 93–94 1, 95–96 2, ≥97 3', () => {
    for (const [v, air, oxygen] of [
      [83, 3, 3],
      [84, 2, 2],
      [85, 2, 2],
      [86, 1, 1],
      [87, 1, 1],
      [88, 0, 0],
      [92, 0, 0],
      [93, 0, 1],
      [94, 0, 1],
      [95, 0, 2],
      [96, 0, 2],
      [97, 0, 3],
      [100, 0, 3],
    ]) {
      expect(news2Spo2Score(v, '2', false), `SpO2 ${v} air`).toBe(air);
      expect(news2Spo2Score(v, '2', true), `SpO2 ${v} oxygen`).toBe(oxygen);
    }
  });
  it('systolic BP: ≤90 3; 91–100 2; 101–110 1; 111–219 0; ≥220 3', () => {
    for (const [v, got, want] of table(news2SystolicScore, [
      [90, 3],
      [91, 2],
      [100, 2],
      [101, 1],
      [110, 1],
      [111, 0],
      [219, 0],
      [220, 3],
    ]))
      expect(got, `SBP ${v}`).toBe(want);
  });
  it('pulse: ≤40 3; 41–50 1; 51–90 0; 91–110 1; 111–130 2; ≥131 3', () => {
    for (const [v, got, want] of table(news2PulseScore, [
      [40, 3],
      [41, 1],
      [50, 1],
      [51, 0],
      [90, 0],
      [91, 1],
      [110, 1],
      [111, 2],
      [130, 2],
      [131, 3],
    ]))
      expect(got, `HR ${v}`).toBe(want);
  });
  it('temperature: ≤35.0 3; 35.1–36.0 1; 36.1–38.0 0; 38.1–39.0 1; ≥39.1 2', () => {
    for (const [v, got, want] of table(news2TemperatureScore, [
      [35.0, 3],
      [35.1, 1],
      [36.0, 1],
      [36.1, 0],
      [38.0, 0],
      [38.1, 1],
      [39.0, 1],
      [39.1, 2],
    ]))
      expect(got, `T ${v}`).toBe(want);
  });
  it('consciousness: alert 0; new confusion, voice, pain, unresponsive 3 (ACVPU)', () => {
    expect(news2ConsciousnessScore('alert')).toBe(0);
    for (const level of ['new-confusion', 'voice', 'pain', 'unresponsive'] as const) expect(news2ConsciousnessScore(level)).toBe(3);
  });
});

const calm: News2Input = {
  respiratoryRate: 16,
  spo2: 97,
  oxygenLitresPerMinute: null,
  systolicBp: 125,
  heartRate: 72,
  consciousness: 'alert',
  temperatureC: 36.8,
};

describe('news2 aggregate (Royal College of Physicians, NEWS2, 2017)', () => {
  it('scores 0 for a calm adult on air', () => {
    expect(news2(calm, '1', 40)).toMatchObject({ total: 0, response: 'low' });
  });
  it('supplemental oxygen scores 2', () => {
    expect(news2({ ...calm, oxygenLitresPerMinute: 2 }, '1', 40)).toMatchObject({ total: 2, parameters: { airOrOxygen: 2 } });
  });
  it('any single 3 is an urgent ward response; 5–6 urgent; 7+ emergency', () => {
    expect(news2({ ...calm, respiratoryRate: 8 }, '1', 40)).toMatchObject({ total: 3, response: 'low-medium' });
    expect(news2Response(4, false)).toBe('low');
    expect(news2Response(5, false)).toBe('medium');
    expect(news2Response(6, false)).toBe('medium');
    expect(news2Response(7, false)).toBe('high');
    expect(news2({ ...calm, respiratoryRate: 8, spo2: 91, oxygenLitresPerMinute: 2 }, '1', 70)).toMatchObject({
      total: 8,
      response: 'high',
    });
  });
  it('is not computed for under-16s, unknown age, or an incomplete or non-finite set', () => {
    expect(news2(calm, '1', 15)).toBeNull();
    expect(news2(calm, '1', null)).toBeNull();
    expect(news2(calm, '1', 16)).not.toBeNull();
    expect(news2({ ...calm, heartRate: null }, '1', 40)).toBeNull();
    expect(news2({ ...calm, consciousness: null }, '1', 40)).toBeNull();
    expect(news2({ ...calm, temperatureC: Number.NaN }, '1', 40)).toBeNull();
  });
});
