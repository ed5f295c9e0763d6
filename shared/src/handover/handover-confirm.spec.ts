import { describe, expect, it } from 'vitest';
import type { PumpSettings } from '../bedside/bedside.schema.js';
import { handoverConfirmRefusal, handoverSettingsMismatches } from './handover-confirm.js';

// Both rules are Lockstep's own design (docs/design.md, "Handover board"), not published values.
describe('handoverConfirmRefusal', () => {
  it('allows a PCA with no open flag, or only review and info flags', () => {
    expect(handoverConfirmRefusal([])).toBeNull();
    expect(
      handoverConfirmRefusal([
        { id: 1, severity: 'review', message: 'Pain 8' },
        { id: 2, severity: 'info', message: 'Syringe low' },
      ]),
    ).toBeNull();
  });

  it('refuses while an urgent flag is open, naming every one', () => {
    expect(handoverConfirmRefusal([{ id: 3, severity: 'urgent', message: 'Sedation 3' }])).toBe(
      'Acknowledge the open urgent flag before confirming this PCA at handover: Sedation 3',
    );
    const refusal = handoverConfirmRefusal([
      { id: 3, severity: 'urgent', message: 'Sedation 3' },
      { id: 4, severity: 'review', message: 'Pain 8' },
      { id: 5, severity: 'urgent', message: 'Respiratory rate 7/min' },
    ]);
    expect(refusal).toContain('flags');
    expect(refusal).toContain('Sedation 3; Respiratory rate 7/min');
    expect(refusal).not.toContain('Pain 8');
  });
});

describe('handoverSettingsMismatches', () => {
  const ordered: PumpSettings = {
    drugId: 1,
    concentrationPerMl: 1,
    syringeVolumeMl: 50,
    loadingDose: null,
    demandDose: 1,
    lockoutMinutes: 5,
    basalRatePerHour: 0,
    oneHourLimit: null,
    fourHourLimit: 30,
  };

  it('finds nothing when the pump equals the order (decimals typed differently included)', () => {
    expect(handoverSettingsMismatches({ ...ordered }, ordered)).toEqual([]);
    expect(handoverSettingsMismatches({ ...ordered, concentrationPerMl: 0.1 + 0.9 }, ordered)).toEqual([]);
  });

  it('names each differing setting, none set versus set included', () => {
    const found = handoverSettingsMismatches({ ...ordered, demandDose: 2, oneHourLimit: 10, fourHourLimit: null }, ordered);
    expect(found.map((mismatch) => mismatch.field)).toEqual(['demandDose', 'oneHourLimit', 'fourHourLimit']);
    expect(found[0].message).toMatch(/^Demand dose differs from the running order/);
  });
});
