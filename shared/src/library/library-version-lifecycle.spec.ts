import { describe, expect, it } from 'vitest';
import { canDoLibraryAction, LIBRARY_TRANSITIONS, LIBRARY_VERSION_ACTIONS, libraryVersionActions } from './library-version-lifecycle.js';
import { LIBRARY_STATUSES } from './library.schema.js';

describe('library version lifecycle', () => {
  it('lets a draft be edited, submitted or discarded, and a submitted version be withdrawn, approved or sent back; nothing else', () => {
    expect(libraryVersionActions('draft')).toEqual(['edit', 'submit', 'discard']);
    expect(libraryVersionActions('pending_approval')).toEqual(['withdraw', 'approve', 'sendBack']);
    expect(LIBRARY_VERSION_ACTIONS.sendBack.to).toBe('draft');
    expect(canDoLibraryAction('sendBack', 'draft')).toBe(false);
    expect(libraryVersionActions('active')).toEqual([]);
    expect(libraryVersionActions('retired')).toEqual([]);
    expect(canDoLibraryAction('approve', 'draft')).toBe(false);
  });

  it('every action moves along a transition of the table (or deletes a draft)', () => {
    for (const { from, to } of Object.values(LIBRARY_VERSION_ACTIONS)) {
      if (to === null || to === from) continue;
      expect(LIBRARY_TRANSITIONS[from]).toContain(to);
    }
    expect(Object.keys(LIBRARY_TRANSITIONS).sort()).toEqual([...LIBRARY_STATUSES].sort());
  });
});
