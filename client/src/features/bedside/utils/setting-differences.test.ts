import { describe, expect, it } from 'vitest';
import type { Drug } from '@lockstep/shared';
import { differenceRows } from './setting-differences';
import { formatPumpSetting, pumpSettingUnit } from '@/utils/pump-setting-format';

const drugs: Drug[] = [
  { id: 1, genericName: 'morphine', doseUnit: 'mg' },
  { id: 2, genericName: 'hydromorphone', doseUnit: 'mg' },
];
const nurses = { first: 'Kai Mendes', second: 'Rosa Adeyemi' };

describe('differenceRows', () => {
  it('names the setting, whose entry differs and every value in safe format', () => {
    const rows = differenceRows(
      [
        { field: 'lockoutMinutes', first: 6, second: 10, ordered: 10, differs: 'first' },
        { field: 'demandDose', first: 0.2, second: 2, ordered: 0.2, differs: 'second' },
        { field: 'drugId', first: 1, second: 1, ordered: 2, differs: 'both' },
        { field: 'oneHourLimit', first: 2, second: 2, ordered: null, differs: 'both' },
      ],
      'mg',
      drugs,
      nurses,
    );
    expect(rows).toEqual([
      {
        field: 'lockoutMinutes',
        label: 'Lockout',
        differs: 'first',
        whose: 'First check (Kai Mendes)',
        first: '6 min',
        second: '10 min',
        ordered: '10 min',
      },
      {
        field: 'demandDose',
        label: 'Demand dose',
        differs: 'second',
        whose: 'Second check (Rosa Adeyemi)',
        first: '0.2 mg',
        second: '2 mg',
        ordered: '0.2 mg',
      },
      {
        field: 'drugId',
        label: 'Drug',
        differs: 'both',
        whose: 'Both checks (Kai Mendes and Rosa Adeyemi)',
        first: 'morphine',
        second: 'morphine',
        ordered: 'HYDROmorphone',
      },
      {
        field: 'oneHourLimit',
        label: '1-hour limit',
        differs: 'both',
        whose: 'Both checks (Kai Mendes and Rosa Adeyemi)',
        first: '2 mg',
        second: '2 mg',
        ordered: 'None',
      },
    ]);
  });
});

describe('formatPumpSetting', () => {
  it('uses the unit of each setting, with a leading zero and no trailing zero (ISMP)', () => {
    expect(formatPumpSetting('concentrationPerMl', 0.2, 'mg', drugs)).toBe('0.2 mg/mL');
    expect(formatPumpSetting('basalRatePerHour', 0.1, 'mg', drugs)).toBe('0.1 mg/h');
    expect(formatPumpSetting('syringeVolumeMl', 50, 'mcg', drugs)).toBe('50 mL');
    expect(formatPumpSetting('demandDose', 20, 'mcg', drugs)).toBe('20 mcg');
    expect(formatPumpSetting('loadingDose', null, 'mg', drugs)).toBe('None');
    expect(formatPumpSetting('drugId', 9, 'mg', drugs)).toBe('Drug no. 9');
    expect(pumpSettingUnit('lockoutMinutes', 'mcg')).toBe('min');
  });
});
