import { withoutFloatNoise } from './float-noise.js';
import { formatDose } from './format-dose.js';
import { isUsableNumber } from './order-number-findings.js';
import type { Finding, Regimen } from './types.js';

// A lockout under a minute is no lockout at all: Lockstep's own floor (docs/design.md, "Order fields
// and dosing conventions"), not a clinical limit; the ward's rule sets the real minimum.
const MIN_LOCKOUT_MINUTES = 1;

/**
 * Errors for a regimen that contradicts itself: a lockout under 1 minute; a demand dose and a
 * basal rate both 0 (the pump would give nothing); a 1-hour limit below an hour of basal plus one
 * demand dose; a 4-hour limit below the 1-hour limit; a 4-hour limit below four hours of basal
 * plus one demand dose. Checks that need an unusable number are skipped: that number has its own
 * error.
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

  if (basal === 0 && demand === 0) {
    findings.push({
      field: 'demandDose',
      severity: 'error',
      code: 'consistency.nothing-to-give',
      message: 'Demand dose and basal rate are both 0: the pump would give nothing. Enter a demand dose or a basal rate',
    });
  }

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

  if (isUsableNumber(r.fourHourLimit) && isUsableNumber(r.oneHourLimit) && r.fourHourLimit < r.oneHourLimit) {
    findings.push({
      field: 'fourHourLimit',
      severity: 'error',
      code: 'consistency.four-hour-limit-below-one-hour-limit',
      message: `4-hour limit ${formatDose(r.fourHourLimit, unit)} is less than the 1-hour limit ${formatDose(r.oneHourLimit, unit)}`,
    });
  }

  if (isUsableNumber(r.fourHourLimit) && basal !== null && demand !== null) {
    const smallestFourHours = withoutFloatNoise(4 * basal + demand);
    if (r.fourHourLimit < smallestFourHours) {
      findings.push({
        field: 'fourHourLimit',
        severity: 'error',
        code: 'consistency.four-hour-limit-below-basal-and-demand',
        message: `4-hour limit ${formatDose(r.fourHourLimit, unit)} is less than four hours of basal rate plus one demand dose (${formatDose(smallestFourHours, unit)})`,
      });
    }
  }

  return findings;
}
