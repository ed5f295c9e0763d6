import { describe, expect, it } from 'vitest';
import { bedsideActionAllowed, bedsideActions, syringeState } from './bedside-actions.js';

describe('bedside actions', () => {
  it('reads the syringe state from the releases', () => {
    expect(syringeState([{ status: 'finished' }, { status: 'in_use' }])).toBe('running');
    expect(syringeState([{ status: 'finished' }, { status: 'ready' }])).toBe('ready');
    expect(syringeState([{ status: 'finished' }])).toBe('none');
  });

  it('a verified order, or an active one between syringes, needs a bedside check; a running one the rest', () => {
    expect(bedsideActions('verified', 'ready')).toEqual(['check']);
    expect(bedsideActions('verified', undefined)).toEqual(['check']);
    expect(bedsideActions('active', 'ready')).toEqual(['check']);
    expect(bedsideActions('active', 'none')).toEqual(['check']);
    expect(bedsideActions('active', 'running')).toEqual(['observe', 'bolus', 'syringe-change', 'discontinue']);
    expect(bedsideActions('active', undefined)).toEqual(['observe', 'bolus', 'syringe-change', 'discontinue']);
    expect(bedsideActions('discontinued', 'none')).toEqual([]);
    expect(bedsideActions('awaiting_verification', undefined)).toEqual([]);
  });

  it('says whether one action is allowed', () => {
    expect(bedsideActionAllowed('bolus', 'active', 'running')).toBe(true);
    expect(bedsideActionAllowed('bolus', 'active', 'ready')).toBe(false);
    expect(bedsideActionAllowed('check', 'active', 'running')).toBe(false);
  });
});
