import { describe, expect, it } from 'vitest';
import { bedsideHint } from './syringe-state';

describe('bedsideHint', () => {
  it('says what the order waits for', () => {
    expect(bedsideHint('verified', 'ready')).toBe('Needs a bedside check to start');
    expect(bedsideHint('verified', 'none')).toBe('Waiting for pharmacy to release a syringe');
    expect(bedsideHint('active', 'ready')).toMatch(/new syringe/);
    expect(bedsideHint('active', 'running')).toBeNull();
  });
});
