import { beforeEach, describe, expect, it, vi } from 'vitest';

// No DOM in the unit tests: a minimal stand-in for React's state hooks renders the hook the way
// React does (lazy initial state once per mount, setState seen on the next render, a stable
// callback when its dependencies do not change).
const harness = vi.hoisted(() => {
  let slots: unknown[] = [];
  let cursor = 0;
  const take = <T>(init: () => T): { value: T; index: number } => {
    const index = cursor++;
    if (!(index in slots)) slots[index] = init();
    return { value: slots[index] as T, index };
  };
  return {
    mount: () => {
      slots = [];
    },
    beginRender: () => {
      cursor = 0;
    },
    useState: <T>(initial: T | (() => T)) => {
      const { value, index } = take(() => (typeof initial === 'function' ? (initial as () => T)() : initial));
      const set = (next: T) => {
        slots[index] = next;
      };
      return [value, set] as const;
    },
    useCallback: <F>(fn: F) => take(() => fn).value,
  };
});

vi.mock('react', () => ({ useState: harness.useState, useCallback: harness.useCallback }));

const { useIdempotencyKey } = await import('./use-idempotency-key');

/** One render of a component that uses the hook. */
function Render() {
  harness.beginRender();
  return useIdempotencyKey();
}
const render = Render;

const UUID = /^[0-9a-f]{8}-[0-9a-f]{4}-4[0-9a-f]{3}-[89ab][0-9a-f]{3}-[0-9a-f]{12}$/;

describe('useIdempotencyKey', () => {
  beforeEach(() => harness.mount());

  it('makes one random key when the form opens and keeps it across re-renders (a double-click or retry reuses it)', () => {
    const first = render();
    expect(first.key).toMatch(UUID);
    expect(render().key).toBe(first.key);
    expect(render().key).toBe(first.key);
    expect(render().renew).toBe(first.renew);
  });

  it('gives a new key after renew (a success), then keeps that one', () => {
    const first = render();
    first.renew();
    const second = render();
    expect(second.key).toMatch(UUID);
    expect(second.key).not.toBe(first.key);
    expect(render().key).toBe(second.key);
  });

  it('gives each new opening of the form its own key', () => {
    const first = render().key;
    harness.mount();
    const reopened = render().key;
    expect(reopened).toMatch(UUID);
    expect(reopened).not.toBe(first);
  });
});
