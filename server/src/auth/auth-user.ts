import type { SessionUser } from '@lockstep/shared';

/** Who is calling: set on the request by the JWT strategy from the live user row. */
export type AuthUser = SessionUser;

export interface JwtPayload {
  sub: number;
  username: string;
  role: string;
  /** The session's id, so signing out can revoke this one token (set by jsonwebtoken from `jwtid`). */
  jti?: string;
  /** Expiry in seconds since the epoch (set by jsonwebtoken). */
  exp?: number;
}
