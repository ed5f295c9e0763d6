import { describe, expect, it } from 'vitest';
import { bedsideActions, bedsideHint, syringeState } from './syringe-state';

describe('syringeState', () => {
  it('prefers a running syringe, then a ready one', () => {
    expect(syringeState([{ status: 'finished' }, { status: 'in_use' }, { status: 'ready' }])).toBe('running');
    expect(syringeState([{ status: 'finished' }, { status: 'ready' }])).toBe('ready');
    expect(syringeState([{ status: 'finished' }])).toBe('none');
    expect(syringeState([])).toBe('none');
  });
});

describe('bedsideActions', () => {
  it('offers a bedside check for a verified order and for an active one between syringes', () => {
    expect(bedsideActions('verified', 'ready')).toEqual(['check']);
    expect(bedsideActions('verified', undefined)).toEqual(['check']);
    expect(bedsideActions('active', 'ready')).toEqual(['check']);
  });

  it('offers bolus, syringe change and discontinue while a syringe runs', () => {
    expect(bedsideActions('active', 'running')).toEqual(['observe', 'bolus', 'syringe-change', 'discontinue']);
    expect(bedsideActions('active', undefined)).toEqual(['observe', 'bolus', 'syringe-change', 'discontinue']);
  });

  it('offers nothing for an order that is not the bedside’s', () => {
    expect(bedsideActions('discontinued', 'none')).toEqual([]);
    expect(bedsideActions('awaiting_verification', undefined)).toEqual([]);
  });
});

describe('bedsideHint', () => {
  it('says what the order waits for', () => {
    expect(bedsideHint('verified', 'ready')).toBe('Needs a bedside check to start');
    expect(bedsideHint('verified', 'none')).toBe('Waiting for pharmacy to release a syringe');
    expect(bedsideHint('active', 'ready')).toMatch(/new syringe/);
    expect(bedsideHint('active', 'running')).toBeNull();
  });
});
