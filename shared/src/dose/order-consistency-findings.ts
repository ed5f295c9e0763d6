import { withoutFloatNoise } from './float-noise.js';
import { formatDose } from './format-dose.js';
import { isUsableNumber } from './order-number-findings.js';
import type { Finding, Regimen } from './types.js';

const MIN_LOCKOUT_MINUTES = 1;

/**
 * Errors for a regimen that contradicts itself: a lockout under 1 minute; a 1-hour limit below
 * an hour of basal plus one demand dose; a 4-hour limit below four hours of basal. Checks that
 * need an unusable number are skipped: that number has its own error.
 */
export function consistencyFindings(r: Regimen): Finding[] {
  const findings: Finding[] = [];
  const unit = r.doseUnit;

  if (isUsableNumber(r.lockoutMinutes) && r.lockoutMinutes < MIN_LOCKOUT_MINUTES) {
    findings.push({
      field: 'lockoutMinutes',
      severity: 'error',
      code: 'lockout.too-short',
      message: 'Lockout must be at least 1 minute',
    });
  }

  const basal = isUsableNumber(r.basalRatePerHour) ? r.basalRatePerHour : null;
  const demand = isUsableNumber(r.demandDose) ? r.demandDose : null;

  if (isUsableNumber(r.oneHourLimit) && basal !== null && demand !== null) {
    const smallestHour = withoutFloatNoise(basal + demand);
    if (r.oneHourLimit < smallestHour) {
      findings.push({
        field: 'oneHourLimit',
        severity: 'error',
        code: 'consistency.one-hour-limit-below-basal-and-demand',
        message: `1-hour limit ${formatDose(r.oneHourLimit, unit)} is less than an hour of basal rate plus one demand dose (${formatDose(smallestHour, unit)})`,
      });
    }
  }

  if (isUsableNumber(r.fourHourLimit) && basal !== null) {
    const fourHoursBasal = withoutFloatNoise(4 * basal);
    if (r.fourHourLimit < fourHoursBasal) {
      findings.push({
        field: 'fourHourLimit',
        severity: 'error',
        code: 'consistency.four-hour-limit-below-basal',
        message: `4-hour limit ${formatDose(r.fourHourLimit, unit)} is less than four hours of basal rate (${formatDose(fourHoursBasal, unit)})`,
      });
    }
  }

  return findings;
}
