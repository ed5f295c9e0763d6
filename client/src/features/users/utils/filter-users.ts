import type { Role, User } from '@lockstep/shared';

export interface UserFilters {
  role: Role | null;
  search: string;
}

/** Role match and a case-insensitive search over username and display name. */
export function filterUsers(users: readonly User[], { role, search }: UserFilters): User[] {
  const needle = search.trim().toLowerCase();
  return users.filter(
    (user) =>
      (role === null || user.role === role) &&
      (!needle || user.username.toLowerCase().includes(needle) || user.displayName.toLowerCase().includes(needle)),
  );
}
