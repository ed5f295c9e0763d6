import type { SessionProfile, SessionUser, User as UserResponse } from '@lockstep/shared';
import type { User } from '../entities/user.entity.js';

export function toUserResponse(user: User): UserResponse {
  return {
    id: user.id,
    username: user.username,
    displayName: user.displayName,
    role: user.role,
    active: user.active,
    wardIds: (user.wards ?? []).map((ward) => ward.id).sort((a, b) => a - b),
    createdAt: user.createdAt.toISOString(),
  };
}

export function toSessionUser(user: User): SessionUser {
  return { id: user.id, username: user.username, displayName: user.displayName, role: user.role };
}

/** Needs the user's wards loaded. */
export function toSessionProfile(user: User): SessionProfile {
  const wards = (user.wards ?? []).map((ward) => ({ id: ward.id, name: ward.name })).sort((a, b) => a.name.localeCompare(b.name));
  return { ...toSessionUser(user), wards };
}
