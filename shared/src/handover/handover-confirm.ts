import { compareSettings } from '../bedside/compare-settings.js';
import { PUMP_SETTING_LABELS, type PumpSettings } from '../bedside/bedside.schema.js';

/** An open flag as the handover rule reads it: enough to name it. */
type HandoverOpenFlag = { id: number; severity: 'info' | 'review' | 'urgent'; message: string };

/**
 * Why a PCA cannot be confirmed at handover, or null when it can: an urgent flag still open must be
 * acknowledged (someone has acted on it) before a nurse hands the PCA over or takes it over.
 * Lockstep's own rule (docs/design.md, "Handover board"): not a published threshold.
 */
export function handoverConfirmRefusal(openFlags: readonly HandoverOpenFlag[]): string | null {
  const urgent = openFlags.filter((flag) => flag.severity === 'urgent');
  if (urgent.length === 0) return null;
  const named = urgent.map((flag) => flag.message).join('; ');
  return `Acknowledge the open urgent ${urgent.length === 1 ? 'flag' : 'flags'} before confirming this PCA at handover: ${named}`;
}

/**
 * The incoming nurse's blind reading of the pump against the running order, with the bedside
 * check's own fields and comparison: the settings that differ, each named, in the pump's order.
 */
export function handoverSettingsMismatches(entered: PumpSettings, ordered: PumpSettings): { field: keyof PumpSettings; message: string }[] {
  return compareSettings(entered, entered, ordered).map(({ field }) => ({
    field,
    message: `${PUMP_SETTING_LABELS[field]} differs from the running order: do not take over; check the pump with the outgoing nurse and escalate`,
  }));
}
