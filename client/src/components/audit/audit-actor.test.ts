import { describe, expect, it } from 'vitest';
import { actorText } from './audit-actor';

describe('actorText', () => {
  it('names the person, or says the system did it', () => {
    expect(actorText({ actorName: 'Lin Park', userId: 2 })).toBe('Lin Park');
    expect(actorText({ actorName: null, userId: 9 })).toBe('User 9');
    expect(actorText({ actorName: null, userId: null })).toBe('Lockstep (automatic)');
  });
});
