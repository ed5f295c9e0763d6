import type { SessionUser } from '@lockstep/shared';

/** Who is calling: set on the request by the JWT strategy from the live user row. */
export type AuthUser = SessionUser;

export interface JwtPayload {
  sub: number;
  username: string;
  role: string;
}
