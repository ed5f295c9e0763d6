import { parseArgs } from 'node:util';

export type ScaleOptions = {
  wards: number;
  beds: number;
  /** Active PCAs now; each bed that has one has had PCAs back to back for `days`. */
  active: number;
  days: number;
  /** The SQLite file to (re)write; relative paths start at the repository root. */
  out: string;
  /** Seed of the pseudo-random values: the same options write the same rows. */
  seed: number;
};

export const DEFAULT_SCALE_OPTIONS: ScaleOptions = {
  wards: 30,
  beds: 1000,
  active: 300,
  days: 30,
  out: 'server/data/lockstep-scale.sqlite',
  seed: 1,
};

/** `--wards 30 --beds 1000 --active 300 --days 30 --out file --seed 1`; throws a readable message on bad input. */
export function parseScaleOptions(argv: string[]): ScaleOptions {
  const { values } = parseArgs({
    args: argv,
    options: {
      wards: { type: 'string' },
      beds: { type: 'string' },
      active: { type: 'string' },
      days: { type: 'string' },
      out: { type: 'string' },
      seed: { type: 'string' },
    },
    strict: true,
  });
  const whole = (name: keyof typeof values, fallback: number, min: number): number => {
    const text = values[name];
    if (text === undefined) return fallback;
    const value = Number(text);
    if (!Number.isInteger(value) || value < min) throw new Error(`--${name} must be a whole number of at least ${min}, not "${text}"`);
    return value;
  };
  const options: ScaleOptions = {
    wards: whole('wards', DEFAULT_SCALE_OPTIONS.wards, 1),
    beds: whole('beds', DEFAULT_SCALE_OPTIONS.beds, 1),
    active: whole('active', DEFAULT_SCALE_OPTIONS.active, 0),
    days: whole('days', DEFAULT_SCALE_OPTIONS.days, 1),
    out: values.out ?? DEFAULT_SCALE_OPTIONS.out,
    seed: whole('seed', DEFAULT_SCALE_OPTIONS.seed, 0),
  };
  if (options.beds < options.wards) throw new Error('--beds must be at least --wards: every ward has a bed');
  // Room for the orders waiting for pharmacy or a bedside check on beds without a running PCA.
  if (options.active > Math.floor(options.beds * 0.8)) throw new Error('--active may be at most 80 % of --beds');
  return options;
}
