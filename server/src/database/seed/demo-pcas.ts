import type { HandoverProgress } from '../scale/scale-orders.js';
import type { ScaleRegimen } from '../scale/scale-regimen.js';
import type { DemoCourseScript } from './demo-script.js';

// The demo hospital caught in the middle of a shift. Every value is INVENTED for the demo; the
// regimens sit inside the demo library (demo-library.ts) and go through the real order check.

type RegimenChoice = Omit<ScaleRegimen, 'drug' | 'doseUnit' | 'concentrationPerMl'>;
const usual = { loadingDose: null, basalRatePerHour: 0, oneHourLimit: null, syringeMl: 50 } as const;

const morphine = (regimen: Partial<RegimenChoice> & Pick<RegimenChoice, 'demandDose' | 'lockoutMinutes' | 'indication'>): ScaleRegimen => ({
  drug: 'morphine',
  doseUnit: 'mg',
  concentrationPerMl: 1,
  ...usual,
  fourHourLimit: 30,
  clinicianBolusDose: 2,
  ...regimen,
});
const hydromorphone = (regimen: Partial<RegimenChoice> & Pick<RegimenChoice, 'demandDose' | 'indication'>): ScaleRegimen => ({
  drug: 'hydromorphone',
  doseUnit: 'mg',
  concentrationPerMl: 0.2,
  ...usual,
  lockoutMinutes: 10,
  fourHourLimit: 6,
  clinicianBolusDose: 0.4,
  ...regimen,
});
const fentanyl = (regimen: Partial<RegimenChoice> & Pick<RegimenChoice, 'demandDose' | 'lockoutMinutes' | 'indication'>): ScaleRegimen => ({
  drug: 'fentanyl',
  doseUnit: 'mcg',
  concentrationPerMl: 10,
  ...usual,
  // Holds what a demand every 6 minutes could give in an hour to the library's soft maximum.
  oneHourLimit: 100,
  fourHourLimit: 200,
  clinicianBolusDose: 20,
  ...regimen,
});

/** An order not started yet: with pharmacy, returned to the prescriber, or verified with a ready syringe. */
export type DemoUnstartedOrder = {
  mrn: string;
  regimen: ScaleRegimen;
  status: 'awaiting_verification' | 'verified' | 'returned';
  signedMinutesAgo: number;
  /** Pharmacy verified or returned it this long after signing. */
  decidedAfterMinutes?: number;
  reason?: string;
  overrideReason?: string;
  releaseCode?: string;
  batch?: string;
};

/** A PCA started by a bedside check, running now or discontinued. */
export type DemoPca = {
  mrn: string;
  regimen: ScaleRegimen;
  /**
   * Minutes since it started; keep 15 to 45 past the hour, so the last hourly observation was that
   * long ago. Or timed so that its syringe (not changed: the next one has not come from pharmacy)
   * empties before the current shift ends, whatever the time of day.
   */
  start: { minutesAgo: number } | 'syringe-empties-this-shift';
  endedMinutesAgo?: number;
  /** No observation for this long: the PCA is overdue for one. */
  unobservedMinutes?: number;
  script: DemoCourseScript;
  currentShift: HandoverProgress;
  bolusAfterHours?: number;
  /** The prescriber's reason for each soft finding (such as what the pump could give in an hour). */
  overrideReason?: string;
};

// The first three keep order ids 1, 2 and 3, as earlier demos had them.
export const DEMO_UNSTARTED_ORDERS: DemoUnstartedOrder[] = [
  {
    mrn: 'KB100231',
    regimen: morphine({ demandDose: 1, lockoutMinutes: 10, fourHourLimit: 35, indication: 'Pain after laparotomy' }),
    status: 'awaiting_verification',
    signedMinutesAgo: 45,
    overrideReason: 'Long midline incision; needed more than 30 mg in 4 hours after his last laparotomy, without sedation (invented)',
  },
  {
    mrn: 'KB100672',
    regimen: hydromorphone({
      demandDose: 0.2,
      basalRatePerHour: 0.1,
      clinicianBolusDose: null,
      indication: 'Pain after bowel resection; regular opioid before admission',
    }),
    status: 'verified',
    signedMinutesAgo: 180,
    decidedAfterMinutes: 20,
    releaseCode: 'HK3-7QT',
    batch: 'DEMO-0412',
  },
  {
    mrn: 'KB101127',
    regimen: fentanyl({
      demandDose: 20,
      lockoutMinutes: 6,
      fourHourLimit: 300,
      clinicianBolusDose: null,
      indication: 'Pain after femoral fracture fixation',
    }),
    status: 'returned',
    signedMinutesAgo: 120,
    decidedAfterMinutes: 20,
    reason: 'Lockout of 6 minutes is shorter than the ward’s usual 10 minutes: please confirm or revise',
  },
];

const SETTLED: Pick<DemoCourseScript, 'pain'> = { pain: [5, 4, 4, 3, 3, 2, 3, 2] };

export const DEMO_PCAS: DemoPca[] = [
  // Harbour: six running, one finished.
  {
    mrn: 'KB100905',
    regimen: morphine({ demandDose: 1, lockoutMinutes: 10, indication: 'Pain after open cholecystectomy' }),
    start: { minutesAgo: 30 * 60 + 20 },
    script: { doses: [3, 2, 2, 2, 1, 2, 3, 1], ...SETTLED },
    currentShift: 'both',
    bolusAfterHours: 3,
  },
  {
    mrn: 'KB100458',
    regimen: morphine({ demandDose: 1, lockoutMinutes: 10, indication: 'Pain after anterior resection' }),
    start: { minutesAgo: 14 * 60 + 30 },
    script: {
      doses: [3, 3, 2, 3, 2, 2],
      pain: [6, 5, 4, 4, 3, 3, 2],
      // Drowsier and slower breathing over the last three hours, sedation 3 at the last.
      ending: [
        { sedationLevel: '2', respiratoryRate: 12, spo2: 94, delivered: 2 },
        { sedationLevel: '2', respiratoryRate: 11, spo2: 93, delivered: 2 },
        { sedationLevel: '3', respiratoryRate: 9, spo2: 92, delivered: 1, painScore: 1, refused: 0 },
      ],
    },
    currentShift: 'outgoing',
  },
  {
    mrn: 'KB100936',
    regimen: hydromorphone({ demandDose: 0.1, syringeMl: 30, indication: 'Pain after hemicolectomy' }),
    start: 'syringe-empties-this-shift',
    script: { doses: [2], pain: [4, 3, 3, 4, 2, 3], onTheHour: true },
    currentShift: 'both',
  },
  {
    mrn: 'KB100819',
    regimen: fentanyl({ demandDose: 10, lockoutMinutes: 6, indication: 'Pain after ventral hernia repair' }),
    start: { minutesAgo: 9 * 60 + 30 },
    unobservedMinutes: 80,
    script: { doses: [4, 3, 3, 2, 2, 2], pain: [6, 5, 4, 4, 3, 3] },
    currentShift: 'both',
  },
  {
    mrn: 'KB100947',
    regimen: morphine({ demandDose: 1.5, lockoutMinutes: 8, indication: 'Pain after open abdominal aortic repair' }),
    overrideReason:
      'Open aortic repair: 1.5 mg every 8 minutes agreed with the acute pain team; up to 14 mg in an hour only with the clinician bolus (invented)',
    start: { minutesAgo: 40 * 60 + 35 },
    // The first syringe comes down 2 mL short: reported to pharmacy, not yet reviewed.
    script: { doses: [2, 2, 1, 2, 1, 2], ...SETTLED, missing: [2] },
    currentShift: 'outgoing',
  },
  {
    mrn: 'KB100958',
    regimen: morphine({
      demandDose: 1.5,
      lockoutMinutes: 10,
      basalRatePerHour: 1,
      indication: 'Pain after spinal decompression; regular opioid before admission',
    }),
    overrideReason: 'Regular opioid before admission: basal 1 mg/h and demand 1.5 mg agreed with the acute pain team (invented)',
    start: { minutesAgo: 20 * 60 + 25 },
    script: { doses: [2, 1, 2, 1, 1, 2], ...SETTLED },
    currentShift: 'none',
  },
  {
    mrn: 'KB100969',
    regimen: morphine({ demandDose: 1, lockoutMinutes: 10, indication: 'Pain after abdominal hysterectomy' }),
    start: { minutesAgo: 40 * 60 + 10 },
    endedMinutesAgo: 3 * 60,
    script: { doses: [1, 2, 1, 0, 1, 1, 0, 1], ...SETTLED },
    currentShift: 'both',
  },
  // One on each of the other wards.
  {
    mrn: 'KB101412',
    regimen: morphine({ demandDose: 1, lockoutMinutes: 10, indication: 'Pain after total knee replacement' }),
    start: { minutesAgo: 16 * 60 + 20 },
    script: { doses: [2, 3, 2, 1, 2, 2], ...SETTLED },
    currentShift: 'both',
  },
  {
    // Wren's rule is per kg: 0.4 mg is 0.016 mg/kg for 24.5 kg; a 20 mL syringe for a child.
    mrn: 'KB102248',
    regimen: morphine({
      demandDose: 0.4,
      lockoutMinutes: 10,
      fourHourLimit: 7,
      clinicianBolusDose: 0.4,
      syringeMl: 20,
      indication: 'Pain after femoral fracture fixation',
    }),
    start: { minutesAgo: 18 * 60 + 15 },
    overrideReason: 'Femoral fracture: over 0.1 mg/kg in an hour only with the clinician bolus; 4-hour limit set at 7 mg (invented)',
    script: { doses: [2, 1, 2, 1, 1, 1], pain: [4, 3, 3, 2, 2, 3] },
    currentShift: 'both',
  },
  {
    mrn: 'KB103355',
    regimen: hydromorphone({
      demandDose: 0.3,
      basalRatePerHour: 0.1,
      indication: 'Pain after thoracotomy; regular opioid before admission',
    }),
    overrideReason: 'Regular opioid before admission; thoracotomy: over 2 mg in an hour only with the clinician bolus (invented)',
    start: { minutesAgo: 26 * 60 + 20 },
    script: { doses: [2, 1, 2, 1, 1, 1], ...SETTLED },
    currentShift: 'both',
  },
];
