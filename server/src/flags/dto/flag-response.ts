import type { FlagResponse } from '@lockstep/shared';
import type { Flag } from '../entities/flag.entity.js';

/** Expects `acknowledgedBy` to be loaded when the flag is acknowledged. */
export function toFlagResponse(flag: Flag): FlagResponse {
  return {
    id: flag.id,
    severity: flag.severity,
    code: flag.code,
    message: flag.message,
    action: flag.action,
    raisedAt: flag.raisedAt.toISOString(),
    acknowledgedAt: flag.acknowledgedAt?.toISOString() ?? null,
    acknowledgedByName: flag.acknowledgedBy?.displayName ?? null,
    acknowledgeNote: flag.acknowledgeNote,
  };
}
