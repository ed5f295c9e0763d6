import { describe, expect, it } from 'vitest';
import type { FlagResponse } from '@lockstep/shared';
import { acknowledgeNoteError, splitFlags } from './flags';

function flag(id: number, severity: FlagResponse['severity'], raisedAt: string, acknowledgedAt: string | null = null): FlagResponse {
  return {
    id,
    severity,
    code: 'x',
    message: 'm',
    action: 'a',
    raisedAt,
    acknowledgedAt,
    acknowledgedByName: acknowledgedAt ? 'Kai Mendes' : null,
    acknowledgeNote: acknowledgedAt ? 'Seen' : null,
  };
}

describe('splitFlags', () => {
  it('puts open flags urgent first, then review, then info, newest first within each', () => {
    const { open, acknowledged } = splitFlags([
      flag(1, 'review', '2026-03-03T10:00:00Z'),
      flag(2, 'urgent', '2026-03-03T09:00:00Z'),
      flag(3, 'info', '2026-03-03T11:00:00Z'),
      flag(4, 'urgent', '2026-03-03T10:30:00Z'),
      flag(5, 'urgent', '2026-03-03T08:00:00Z', '2026-03-03T08:30:00Z'),
      flag(6, 'review', '2026-03-03T08:00:00Z', '2026-03-03T09:30:00Z'),
    ]);
    expect(open.map((f) => f.id)).toEqual([4, 2, 1, 3]);
    expect(acknowledged.map((f) => f.id)).toEqual([6, 5]);
  });
});

describe('acknowledgeNoteError', () => {
  it('asks for what was done, at least 5 characters', () => {
    expect(acknowledgeNoteError('   ')).toBe('Say what was done about the flag');
    expect(acknowledgeNoteError(' ok  ')).toBe('Say what was done (at least 5 characters)');
    expect(acknowledgeNoteError('Dose reduced')).toBeNull();
    expect(acknowledgeNoteError('x'.repeat(1001))).toBe('The note is at most 1,000 characters');
  });
});
