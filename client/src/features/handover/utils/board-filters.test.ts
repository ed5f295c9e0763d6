import { describe, expect, it } from 'vitest';
import type { HandoverRow, HandoverSignoffResponse } from '@lockstep/shared';
import { filterRows, NO_FILTERS, rowSeverity, signoffProgress, signoffProgressText } from './board-filters';

type Row = Pick<HandoverRow, 'bed' | 'status' | 'flags' | 'nextObservation' | 'syringe' | 'signoffs'>;

const calm: Row = {
  bed: 'H01',
  status: 'active',
  flags: { urgent: 0, review: 0, info: 0, open: [] },
  nextObservation: { dueAt: '2026-12-02T07:00:00.000Z', overdueMinutes: 0, severity: null },
  syringe: { remainingMl: 30, projectedEmptyAt: null, emptiesThisShift: false },
  signoffs: [],
};

const row = (bed: string, changes: Partial<Row> = {}): Row => ({ ...calm, bed, ...changes });
const flags = (urgent: number, review: number, info: number) => ({ urgent, review, info, open: [] });
const overdue = (minutes: number, severity: 'review' | 'urgent') => ({
  dueAt: '2026-12-02T05:00:00.000Z',
  overdueMinutes: minutes,
  severity,
});
const signoff = (role: 'outgoing' | 'incoming'): HandoverSignoffResponse => ({
  id: 1,
  orderId: 1,
  shiftDate: '2026-12-01',
  shift: 'night',
  role,
  nurseName: role === 'outgoing' ? 'Kai Mendes' : 'Rosa Adeyemi',
  pumpSettingsMatch: role === 'incoming' ? true : null,
  at: '2026-12-02T06:50:00.000Z',
});

describe('filterRows', () => {
  const rows = [
    row('H03', { flags: flags(1, 0, 0) }),
    row('H01', { nextObservation: overdue(12, 'review') }),
    row('H02'),
    row('H04', { flags: flags(0, 0, 1), nextObservation: overdue(90, 'urgent') }),
  ];
  const beds = (kept: Row[]) => kept.map((kept) => kept.bed);

  it('keeps every row, in the order given, with no filter', () => {
    expect(beds(filterRows(rows, NO_FILTERS))).toEqual(['H03', 'H01', 'H02', 'H04']);
  });

  it('"Only flagged" keeps rows with any open flag', () => {
    expect(beds(filterRows(rows, { onlyFlagged: true, onlyOverdue: false }))).toEqual(['H03', 'H04']);
  });

  it('"Only overdue" keeps rows whose observation is overdue', () => {
    expect(beds(filterRows(rows, { onlyFlagged: false, onlyOverdue: true }))).toEqual(['H01', 'H04']);
  });

  it('both filters keep rows that are flagged and overdue', () => {
    expect(beds(filterRows(rows, { onlyFlagged: true, onlyOverdue: true }))).toEqual(['H04']);
  });

  it('a PCA not yet started (no next observation) is never overdue', () => {
    expect(filterRows([row('H02', { nextObservation: null })], { onlyFlagged: false, onlyOverdue: true })).toEqual([]);
  });
});

describe('rowSeverity', () => {
  it('takes the highest of flags, overdue observation and syringe', () => {
    expect(rowSeverity(row('A', { flags: flags(1, 2, 3) }))).toBe('urgent');
    expect(rowSeverity(row('A', { nextObservation: overdue(75, 'urgent') }))).toBe('urgent');
    expect(rowSeverity(row('A', { flags: flags(0, 1, 0) }))).toBe('review');
    expect(rowSeverity(row('A', { nextObservation: overdue(5, 'review') }))).toBe('review');
    expect(
      rowSeverity(row('A', { syringe: { remainingMl: 4, projectedEmptyAt: '2026-12-02T06:30:00.000Z', emptiesThisShift: true } })),
    ).toBe('review');
    expect(rowSeverity(row('A', { flags: flags(0, 0, 1) }))).toBe('info');
    expect(rowSeverity(calm)).toBe('routine');
  });
});

describe('signoffProgress', () => {
  it('counts active PCAs confirmed by both nurses', () => {
    const rows = [
      row('H01', { signoffs: [signoff('outgoing'), signoff('incoming')] }),
      row('H02', { signoffs: [signoff('outgoing')] }),
      row('H03'),
      row('H04', { status: 'verified' }),
    ];
    expect(signoffProgress(rows)).toEqual({ confirmed: 1, total: 3 });
    expect(signoffProgressText(signoffProgress(rows))).toBe('1 of 3 PCAs confirmed');
  });

  it('words one PCA and none', () => {
    expect(signoffProgressText({ confirmed: 1, total: 1 })).toBe('1 of 1 PCA confirmed');
    expect(signoffProgressText({ confirmed: 0, total: 0 })).toBe('No active PCAs to confirm');
  });
});
