import type { LibraryStatus } from './library.schema.js';

export type LibraryVersionAction = 'edit' | 'submit' | 'withdraw' | 'discard' | 'approve' | 'sendBack';

/**
 * The dose-limit library version lifecycle, as a table like the order one: draft → awaiting
 * approval → active → retired (when a newer version is approved), back to draft by withdrawing
 * (its authors) or by being sent back with a comment (a reviewing pharmacist), or discarded while
 * a draft. What each action needs and leads to; `null` is "deleted".
 */
export const LIBRARY_VERSION_ACTIONS: Readonly<
  Record<LibraryVersionAction, { from: LibraryStatus; to: LibraryStatus | null; what: string }>
> = {
  edit: { from: 'draft', to: 'draft', what: 'change its rules' },
  submit: { from: 'draft', to: 'pending_approval', what: 'submit it' },
  withdraw: { from: 'pending_approval', to: 'draft', what: 'withdraw it' },
  discard: { from: 'draft', to: null, what: 'discard it' },
  approve: { from: 'pending_approval', to: 'active', what: 'approve it' },
  sendBack: { from: 'pending_approval', to: 'draft', what: 'send it back' },
};

/** Statuses a version moves between; an active version retires when another is approved for its ward. */
export const LIBRARY_TRANSITIONS: Readonly<Record<LibraryStatus, readonly LibraryStatus[]>> = {
  draft: ['pending_approval'],
  pending_approval: ['draft', 'active'],
  active: ['retired'],
  retired: [],
};

/** What a pharmacist can do with a version in this status. */
export function libraryVersionActions(status: LibraryStatus): LibraryVersionAction[] {
  return (Object.keys(LIBRARY_VERSION_ACTIONS) as LibraryVersionAction[]).filter(
    (action) => LIBRARY_VERSION_ACTIONS[action].from === status,
  );
}

export function canDoLibraryAction(action: LibraryVersionAction, status: LibraryStatus): boolean {
  return LIBRARY_VERSION_ACTIONS[action].from === status;
}
