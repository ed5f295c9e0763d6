import { describe, expect, it } from 'vitest';
import type { User } from '@lockstep/shared';
import { filterUsers } from './filter-users';
import { createUserFormSchema, editFormValuesOf, editUserFormSchema, userChanges } from './user-form-schemas';

const nurse: User = {
  id: 4,
  username: 'kai.mendes',
  displayName: 'Kai Mendes',
  role: 'nurse',
  active: true,
  wardIds: [2, 1],
  createdAt: '2026-01-01T00:00:00.000Z',
};
const admin: User = { ...nurse, id: 7, username: 'sam.rivera', displayName: 'Sam Rivera', role: 'admin', wardIds: [] };

describe('filterUsers', () => {
  it('filters by role and by username or name, ignoring case', () => {
    expect(filterUsers([nurse, admin], { role: 'admin', search: '' })).toEqual([admin]);
    expect(filterUsers([nurse, admin], { role: null, search: 'MENDES' })).toEqual([nurse]);
    expect(filterUsers([nurse, admin], { role: null, search: 'sam.r' })).toEqual([admin]);
    expect(filterUsers([nurse, admin], { role: 'nurse', search: 'sam' })).toEqual([]);
  });
});

describe('user forms', () => {
  it('asks for a role in words when none is chosen', () => {
    const result = createUserFormSchema.safeParse({
      username: 'new.user',
      displayName: 'New User',
      role: null,
      wardIds: [],
      password: 'long-enough-pass',
    });
    expect(result.success).toBe(false);
    expect(result.error?.issues.map((i) => [i.path.join('.'), i.message])).toEqual([['role', 'Choose a role']]);
  });

  it('lets the edit form keep the password blank but checks one that is typed', () => {
    const values = editFormValuesOf(nurse);
    expect(editUserFormSchema.safeParse(values).success).toBe(true);
    const short = editUserFormSchema.safeParse({ ...values, password: 'short' });
    expect(short.error?.issues[0]?.message).toBe('Password must be at least 12 characters');
  });

  it('sends only what changed', () => {
    const values = editFormValuesOf(nurse);
    expect(userChanges(nurse, { ...values, wardIds: [1, 2] })).toEqual({});
    expect(userChanges(nurse, { ...values, displayName: ' Kai M. Mendes ', role: 'charge_nurse', password: 'a-new-password-1' })).toEqual({
      displayName: 'Kai M. Mendes',
      role: 'charge_nurse',
      password: 'a-new-password-1',
    });
  });
});
