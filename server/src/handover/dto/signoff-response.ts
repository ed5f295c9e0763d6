import type { HandoverSignoffResponse } from '@lockstep/shared';
import type { HandoverSignoff } from '../entities/handover-signoff.entity.js';

/** Expects `nurse` loaded. */
export function toSignoffResponse(signoff: HandoverSignoff): HandoverSignoffResponse {
  return {
    id: signoff.id,
    orderId: signoff.orderId,
    shiftDate: signoff.shiftDate,
    shift: signoff.shift,
    role: signoff.role,
    nurseName: signoff.nurse.displayName,
    pumpSettingsMatch: signoff.pumpSettingsMatch,
    at: signoff.at.toISOString(),
  };
}
