import type { PaediatricVitalBand, SedationLevel } from '@lockstep/shared';
import type { HourContext, HourValues, ObservationScript } from '../scale/observation-script.js';
import type { Random } from '../scale/random.js';

/** How one demo patient's hours go. Invented values, for the demo only. */
export type DemoCourseScript = {
  /** Demand doses delivered each hour, the pattern repeated. */
  doses: readonly number[];
  /** Pain scores (0–10) at each observation, the pattern repeated. */
  pain: readonly number[];
  /** The last observations, oldest first: a trend the charts show (sedation creeping up, say). */
  ending?: readonly Partial<HourValues>[];
  /** mL missing at each syringe's take-down, by syringe (0 for the first). */
  missing?: readonly number[];
  /** Observations exactly on the hour from the start (the projected syringe-empty time depends on it). */
  onTheHour?: boolean;
};

const CALM_SEDATION: readonly SedationLevel[] = ['1', '1', 'S', '1', '2', 'S'];

/** A demo patient's observations: the script's doses, pain and ending, calm breathing and oxygen around them. */
export class DemoScript implements ObservationScript {
  constructor(
    private readonly random: Random,
    private readonly script: DemoCourseScript,
    /** How many observations the course will have, so the ending lands on the last ones. */
    private readonly observations: number,
    /** A child's band (shared paediatric-vital-bands.ts): calm breathing within its normal range. */
    private readonly child: PaediatricVitalBand | null = null,
  ) {}

  offsetMinutes(): number {
    return this.script.onTheHour ? 0 : this.random.int(-4, 4);
  }

  hour({ hour, last }: HourContext): HourValues {
    const { doses, pain, ending = [] } = this.script;
    const r = this.random;
    const calm: HourValues = {
      delivered: doses[(hour - 1) % doses.length],
      refused: r.chance(0.25) ? 1 : 0,
      painScore: pain[(hour - 1) % pain.length],
      sedationLevel: CALM_SEDATION[(hour - 1) % CALM_SEDATION.length],
      respiratoryRate: this.child ? r.int(this.child.respiratoryRate.low, this.child.respiratoryRate.high) : r.int(13, 18),
      spo2: r.int(94, 98),
    };
    const fromEnd = last ? 0 : this.observations - hour;
    const scripted = fromEnd >= 0 && fromEnd < ending.length ? ending[ending.length - 1 - fromEnd] : {};
    return { ...calm, ...scripted };
  }

  missingAtTakeDown(index: number): number {
    return this.script.missing?.[index] ?? 0;
  }
}
