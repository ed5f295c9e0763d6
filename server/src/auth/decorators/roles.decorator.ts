import { SetMetadata } from '@nestjs/common';
import type { Role } from '@lockstep/shared';

export const ROLES_KEY = 'roles';

/** Limits a route (or every route of a controller) to these roles; others get 403. */
export const Roles = (...roles: Role[]) => SetMetadata(ROLES_KEY, roles);
