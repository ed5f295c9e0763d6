import {
  type PaediatricVitalBand,
  paediatricVitalBand,
  type SedationLevel,
  usesPaediatricBands,
  type VitalsPatient,
} from '@lockstep/shared';
import type { Random } from './random.js';

/** What the patient and the pump showed at one hourly observation, before the syringe caps it. */
export type HourValues = {
  /** Demand doses the pump delivered since the last observation (capped by what is left). */
  delivered: number;
  /** Presses that the lockout or an empty syringe refused, on top of the delivered ones. */
  refused: number;
  painScore: number;
  sedationLevel: SedationLevel;
  respiratoryRate: number;
  spo2: number;
};

export type HourContext = {
  /** 1 for the first observation after the start. */
  hour: number;
  /** The last observation that will be written for this order. */
  last: boolean;
};

/**
 * Where a PCA's observations come from: the scale seed draws them at random, the demo follows a
 * script per patient. The syringe writer turns them into cumulative pump totals, flags and changes.
 */
export interface ObservationScript {
  /** Minutes this observation lands before (−) or after (+) the hour. */
  offsetMinutes(): number;
  hour(context: HourContext): HourValues;
  /** mL missing (not infused, not wasted) when syringe `index` (0 for the first) is taken down. */
  missingAtTakeDown(index: number): number;
}

/**
 * The children's band a patient's observations are judged by (shared breathing-flags.ts), or null for an adult:
 * a settled child breathes within the band's normal range, not an adult's.
 */
export function childBandOf(patient: VitalsPatient): PaediatricVitalBand | null {
  return usesPaediatricBands(patient) ? paediatricVitalBand(patient.ageYears) : null;
}

/** The scale seed's values: settled patients, the odd struggling hour, unacceptable sedation at the end if asked. */
export class RandomScript implements ObservationScript {
  constructor(
    private readonly random: Random,
    private readonly sedatedAtLast: boolean,
    /** A child's band: settled breathing within its normal range, slowed just below it when sedated. */
    private readonly child: PaediatricVitalBand | null = null,
  ) {}

  offsetMinutes(): number {
    return this.random.int(-5, 5);
  }

  hour({ hour, last }: HourContext): HourValues {
    const r = this.random;
    const early = hour <= 24;
    const delivered = r.int(0, early ? 4 : 3);
    const struggling = r.chance(0.01);
    const sedated = last && this.sedatedAtLast;
    return {
      delivered,
      painScore: struggling ? r.int(7, 9) : Math.max(0, (early ? 4 : 3) + r.int(-2, 2)),
      sedationLevel: sedated ? '3' : r.pick<SedationLevel>(['S', '1', '1', '1', '2']),
      respiratoryRate: this.respiratoryRate(sedated),
      spo2: r.int(93, 99),
      refused: struggling ? delivered + r.int(2, 4) : r.chance(0.3) ? r.int(1, 2) : 0,
    };
  }

  /** Drawn only when calm, as before children had their own range, so adults' values are unchanged. */
  private respiratoryRate(sedated: boolean): number {
    const band = this.child?.respiratoryRate;
    if (sedated) return band ? band.low - 1 : 9;
    return band ? this.random.int(band.low, band.high) : this.random.int(11, 20);
  }

  missingAtTakeDown(): number {
    // Now and then what is left does not add up, so the board has reconciliations to report.
    return this.random.chance(0.02) ? 1 : 0;
  }
}
