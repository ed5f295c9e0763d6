import {
  createReleaseSchema,
  secondReleaseRefusal,
  USUAL_SYRINGE_ML,
  type CreateReleaseRequest,
  type OrderSummary,
  type ReleaseStatus,
} from '@lockstep/shared';
import { readAmount } from './order-form';

export type ReleaseFormValues = {
  concentrationPerMl: string;
  volumeMl: string;
  batch: string;
  /** Local date and time as a datetime-local input gives it: 2026-03-05T14:30. */
  expiresAt: string;
  preparedBy: string;
  checkedBy: string;
  overrideReason: string;
  /** Why a second syringe is released while the order has one ready or running. */
  secondSyringeReason: string;
};

/** Volume of a usual PCA syringe, offered first. */
export const DEFAULT_VOLUME_ML = 50;

export function releaseFormValues(order: Pick<OrderSummary, 'concentrationPerMl'>): ReleaseFormValues {
  return {
    concentrationPerMl: String(order.concentrationPerMl),
    volumeMl: String(DEFAULT_VOLUME_ML),
    batch: '',
    expiresAt: '',
    preparedBy: '',
    checkedBy: '',
    overrideReason: '',
    secondSyringeReason: '',
  };
}

/** True for a volume outside the usual 20–60 mL syringe, which needs a reason. */
export function isUnusualVolume(volumeMl: number | null): boolean {
  if (volumeMl === null || !Number.isFinite(volumeMl)) return false;
  return volumeMl < USUAL_SYRINGE_ML.min || volumeMl > USUAL_SYRINGE_ML.max;
}

/** A datetime-local value (read in the browser's time zone) as an ISO instant; '' if unreadable. */
export function localDateTimeToIso(value: string): string {
  if (!/^\d{4}-\d{2}-\d{2}T\d{2}:\d{2}/.test(value)) return '';
  const date = new Date(value);
  return Number.isNaN(date.getTime()) ? '' : date.toISOString();
}

export type ReadRelease = { request: CreateReleaseRequest | null; errors: Record<string, string> };

/**
 * The form checked against the shared schema, plus the reason an unusual volume needs and, when the
 * order already has a ready or running syringe (`releases`), the reason for a second one.
 */
export function readReleaseForm(
  values: ReleaseFormValues,
  now: Date,
  releases: readonly { releaseCode: string; status: ReleaseStatus }[] = [],
  /** The server's 409 when it knew of an open syringe this screen did not: its words stand beside the field. */
  serverRefusal: string | null = null,
): ReadRelease {
  const secondReason = values.secondSyringeReason.trim();
  const secondRefusal = secondReleaseRefusal(releases, secondReason) ?? (serverRefusal && secondReason === '' ? serverRefusal : null);
  const needsSecondReason = secondReleaseRefusal(releases, null) !== null || serverRefusal !== null;
  const volume = readAmount(values.volumeMl);
  const unusual = isUnusualVolume(volume);
  const reason = values.overrideReason.trim();
  const expiresAt = localDateTimeToIso(values.expiresAt);
  const candidate = {
    concentrationPerMl: readAmount(values.concentrationPerMl) ?? Number.NaN,
    volumeMl: volume ?? Number.NaN,
    batch: values.batch,
    expiresAt,
    preparedBy: values.preparedBy,
    checkedBy: values.checkedBy,
    // Only an unusual volume carries a reason; a reason typed before the volume changed is dropped.
    ...(unusual ? { overrideReason: reason } : {}),
    // Only sent while the order has a ready or running syringe (known here or named by the server's 409).
    ...(needsSecondReason ? { secondSyringeReason: secondReason } : {}),
  };
  const errors: Record<string, string> = {};
  const parsed = createReleaseSchema.safeParse(candidate);
  if (!parsed.success) {
    for (const issue of parsed.error.issues) {
      const field = String(issue.path[0] ?? '');
      const notANumber = (field === 'concentrationPerMl' || field === 'volumeMl') && Number.isNaN(candidate[field]);
      errors[field] ??= notANumber ? 'Enter a number more than 0' : issue.message;
    }
  }
  if (unusual && reason === '')
    errors.overrideReason = `Outside the usual ${USUAL_SYRINGE_ML.min}–${USUAL_SYRINGE_ML.max} mL: give a reason`;
  if (secondRefusal) errors.secondSyringeReason = secondRefusal;
  if (expiresAt && new Date(expiresAt).getTime() <= now.getTime()) errors.expiresAt ??= 'The expiry must be later than now';
  return { request: parsed.success && Object.keys(errors).length === 0 ? parsed.data : null, errors };
}
