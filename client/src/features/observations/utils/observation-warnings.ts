import {
  ADULT_VITALS_PATIENT,
  ageInYears,
  CONSCIOUSNESS_LEVELS,
  type Consciousness,
  DEFAULT_WARD_POLICY,
  type DeliveryRegimen,
  type FlagDraft,
  type FlagResponse,
  isSedationOrBreathingFlag,
  observationFlags,
  type ObservationResponse,
  type ObservationValues,
  type Patient,
  type PreviousReading,
  SEDATION_LEVELS,
  type SedationLevel,
  syringeStartReading,
  type VitalsPatient,
  type Ward,
  type WardPolicy,
} from '@lockstep/shared';
import { readNumber } from '@/lib/number-input';
import { numberFieldError, type NumberField, type ObservationFormValues, pumpBounds, readLocalDateTime } from './observation-form';

/** A finding saving will raise: urgent or review, never info (the form says nothing of those). */
export type ObservationFinding = FlagDraft & { severity: 'urgent' | 'review' };

/** What the form needs besides the values: the order, its readings, the ward's policy and who the patient is. */
export interface ObservationWarningContext {
  order: DeliveryRegimen & {
    startedAt: string | null;
    releases: readonly { id: number; status: string; volumeMl: number }[];
    flags: readonly Pick<FlagResponse, 'severity' | 'code' | 'raisedAt' | 'acknowledgedAt'>[];
  };
  observations: readonly ObservationResponse[];
  /** The ward's policy; the defaults (the floors' values) until it is loaded. */
  policy: WardPolicy | undefined;
  /** Age, ward population and SpO2 scale; adult scale 1 until the patient is loaded. */
  patient: VitalsPatient | undefined;
  now: Date;
}

const FOUR_HOURS_MS = 4 * 3_600_000;

// Stand-ins for a sedation level, respiratory rate or SpO2 not typed yet: values that raise nothing
// themselves, so each typed one is checked as soon as it is typed. Flags that read a stand-in are dropped.
const NOT_TYPED_YET = { sedationLevel: '1', respiratoryRate: 16, spo2: 98 } as const;

// The flags the form cannot foresee: volume against doses needs the clinician boluses and loading dose
// given since the last reading, which the server adds. The server still raises them.
const NOT_FORESEEN = new Set(['delivery.volume-mismatch']);

/** A number typed and within its plausible range; anything else is not read. */
function typedNumber(values: ObservationFormValues, field: NumberField): number | null {
  const value = readNumber(values[field]);
  return typeof value === 'number' && numberFieldError(field, values[field]) === null ? value : null;
}

/** Which typed values a flag reads, by its code: it is said only when all of them were typed. */
function needs(code: string): 'sedation' | 'respiratory-rate' | 'spo2' | 'all-vitals' | 'pump' {
  if (code.startsWith('sedation.')) return 'sedation';
  if (code.startsWith('respiratory-rate.')) return 'respiratory-rate';
  if (code.startsWith('spo2.')) return 'spo2';
  if (code.startsWith('pain.') || code.startsWith('delivery.') || code.startsWith('syringe.')) return 'pump';
  // NEWS2, consciousness, heart rate: with the whole set of vitals.
  return 'all-vitals';
}

/** The running syringe's start (0 delivered, 0 mL) when it is the first syringe; a later one's start is not known here. */
function syringeStart(ctx: ObservationWarningContext): PreviousReading | null {
  const firstSyringe = ctx.order.releases.every((release) => release.status !== 'finished');
  return firstSyringe && ctx.order.startedAt ? syringeStartReading(ctx.order.startedAt) : null;
}

/** The reading before this one on the running syringe, or its start; null when not known here (the server still checks). */
function previousReading(ctx: ObservationWarningContext, runningId: number, at: Date): PreviousReading | null {
  return pumpBounds(ctx.observations, runningId, at).floor ?? syringeStart(ctx);
}

/**
 * What saving the observation as typed will raise, urgent first then review, worked out by the shared
 * `observationFlags` the server raises them with (the same bands, NEWS2, pain, delivery and syringe rules),
 * from what the form knows: the order, its readings, the ward's policy and the patient. Each finding is said
 * once the values it reads are typed. Warnings, not errors: the values are saved as typed.
 */
export function observationFindings(values: ObservationFormValues, ctx: ObservationWarningContext): ObservationFinding[] {
  const at = readLocalDateTime(values.at.trim()) ?? ctx.now;
  const sedation = (SEDATION_LEVELS as readonly string[]).includes(values.sedationLevel) ? (values.sedationLevel as SedationLevel) : null;
  const respiratoryRate = typedNumber(values, 'respiratoryRate');
  const spo2 = typedNumber(values, 'spo2');
  const consciousness = (CONSCIOUSNESS_LEVELS as readonly string[]).includes(values.consciousness)
    ? (values.consciousness as Consciousness)
    : null;
  const allVitals = sedation !== null && respiratoryRate !== null && spo2 !== null;
  const pump = {
    painScore: typedNumber(values, 'painScore'),
    attempts: typedNumber(values, 'attempts'),
    delivered: typedNumber(values, 'delivered'),
    volumeInfusedMl: typedNumber(values, 'volumeInfusedMl'),
    syringeRemainingMl: typedNumber(values, 'syringeRemainingMl'),
  };
  const running = ctx.order.releases.find((release) => release.status === 'in_use') ?? null;
  const pumpTyped = allVitals && running !== null && Object.values(pump).every((value) => value !== null);
  const previous = pumpTyped && running ? previousReading(ctx, running.id, at) : null;

  const current: ObservationValues = {
    at: at.toISOString(),
    sedationLevel: sedation ?? NOT_TYPED_YET.sedationLevel,
    respiratoryRate: respiratoryRate ?? NOT_TYPED_YET.respiratoryRate,
    spo2: spo2 ?? NOT_TYPED_YET.spo2,
    oxygenLitresPerMinute: typedNumber(values, 'oxygenLitresPerMinute'),
    heartRate: typedNumber(values, 'heartRate'),
    systolicBp: typedNumber(values, 'systolicBp'),
    temperatureC: typedNumber(values, 'temperatureC'),
    consciousness,
    // Read only with a previous reading, which is there only when every pump value was typed.
    painScore: pump.painScore ?? 0,
    attempts: pump.attempts ?? 0,
    delivered: pump.delivered ?? 0,
    volumeInfusedMl: pump.volumeInfusedMl ?? 0,
    syringeRemainingMl: pump.syringeRemainingMl ?? 0,
  };
  const windowStart = at.getTime() - FOUR_HOURS_MS;
  // As the server reads them: the syringe's start and its readings of the last 4 hours.
  const start = syringeStart(ctx);
  const earlier: PreviousReading[] = running
    ? [
        ...(start && Date.parse(start.at) <= at.getTime() ? [start] : []),
        ...ctx.observations.filter(
          (o) => o.releaseId === running.id && Date.parse(o.at) >= windowStart && Date.parse(o.at) <= at.getTime(),
        ),
      ]
    : [];
  const drafts = observationFlags(
    current,
    previous,
    ctx.order.basalRatePerHour / ctx.order.concentrationPerMl,
    ctx.policy ?? DEFAULT_WARD_POLICY,
    {
      regimen: ctx.order,
      earlier,
      syringeVolumeMl: running?.volumeMl ?? null,
      urgentBreathingOpen: ctx.order.flags.some(
        (flag) => flag.severity === 'urgent' && flag.acknowledgedAt === null && isSedationOrBreathingFlag(flag.code),
      ),
      patient: ctx.patient ?? ADULT_VITALS_PATIENT,
    },
  );

  const typed = {
    sedation: sedation !== null,
    'respiratory-rate': respiratoryRate !== null,
    spo2: spo2 !== null,
    'all-vitals': allVitals,
    pump: previous !== null,
  };
  const findings = drafts.filter(
    (draft): draft is ObservationFinding =>
      (draft.severity === 'urgent' || draft.severity === 'review') &&
      typed[needs(draft.code)] &&
      !NOT_FORESEEN.has(draft.code) &&
      !(draft.code === 'syringe.low' && syringeLowRaised(ctx, running?.id ?? null)),
  );
  return [...findings.filter((f) => f.severity === 'urgent'), ...findings.filter((f) => f.severity === 'review')];
}

/**
 * The server raises "syringe low" once per syringe: already raised when a syringe-low flag came at or
 * after this syringe's first reading (flags are raised as readings are recorded).
 */
function syringeLowRaised(ctx: ObservationWarningContext, runningId: number | null): boolean {
  const first = ctx.observations.find((o) => o.releaseId === runningId);
  if (!first) return false;
  return ctx.order.flags.some((flag) => flag.code === 'syringe.low' && Date.parse(flag.raisedAt) >= Date.parse(first.at));
}

/** The field a finding is said beside; null for one said only in the summary (NEWS2). */
export type WarnedField = 'sedationLevel' | 'respiratoryRate' | 'spo2' | 'painScore' | 'delivered' | 'syringeRemainingMl' | 'heartRate';

export function findingField(code: string): WarnedField | null {
  if (code.startsWith('sedation.')) return 'sedationLevel';
  if (code.startsWith('respiratory-rate.')) return 'respiratoryRate';
  if (code.startsWith('spo2.')) return 'spo2';
  if (code.startsWith('heart-rate.')) return 'heartRate';
  if (code.startsWith('pain.')) return 'painScore';
  if (code.startsWith('delivery.')) return 'delivered';
  if (code.startsWith('syringe.')) return 'syringeRemainingMl';
  return null;
}

/** A warning beside one field: its tier, what it says and what to do. */
export type FieldWarning = { severity: 'urgent' | 'review'; text: string; action?: string };

/** Each field's most severe finding (urgent first), worded with its tier. */
export function fieldWarnings(findings: readonly ObservationFinding[]): Partial<Record<WarnedField, FieldWarning>> {
  const warnings: Partial<Record<WarnedField, FieldWarning>> = {};
  for (const finding of findings) {
    const field = findingField(finding.code);
    if (!field || warnings[field]) continue;
    warnings[field] = { severity: finding.severity, text: finding.message, action: finding.action };
  }
  return warnings;
}

/** "Saving raises 2 urgent flags: act now" / "Saving raises 1 review flag". */
export function findingsHeadline(severity: 'urgent' | 'review', count: number): string {
  const flags = `${count} ${severity} flag${count === 1 ? '' : 's'}`;
  return severity === 'urgent' ? `Urgent: saving raises ${flags}. Act now, do not wait for the save` : `Review: saving raises ${flags}`;
}

/**
 * Who the bands are for, as the server reads it when the observation is saved: the patient's age, whether
 * the ward's population is paediatric, and the SpO2 scale a prescriber chose.
 */
export function vitalsPatientFor(
  patient: Pick<Patient, 'dateOfBirth' | 'spo2Scale'>,
  ward: Pick<Ward, 'population'>,
  at: Date,
): VitalsPatient {
  return { ageYears: ageInYears(patient.dateOfBirth, at), paediatricWard: ward.population === 'paediatric', spo2Scale: patient.spo2Scale };
}
