import { parseArgs } from 'node:util';

export type BenchOptions = {
  /** Seconds of load per measurement (the figure: 10). */
  seconds: number;
  connections: number;
  /** Seconds of unmeasured load before each measurement. */
  warmupSeconds: number;
  /** The full dataset; the small one is these divided by `factor`, with the same busy ward. */
  wards: number;
  beds: number;
  active: number;
  days: number;
  factor: number;
  /** Reuse the datasets already written instead of writing them afresh (their times go stale). */
  seed: boolean;
  renderRuns: number;
  /** Write the figures into this Markdown file between its bench markers; null: print only. */
  doc: string | null;
};

const DEFAULTS: BenchOptions = {
  seconds: 10,
  connections: 50,
  warmupSeconds: 3,
  wards: 30,
  beds: 1000,
  active: 300,
  days: 30,
  factor: 10,
  seed: true,
  renderRuns: 5,
  doc: 'docs/performance.md',
};

/** `npm run bench -- --seconds 2 --connections 10 --no-write` and so on; defaults are the issue's. */
export function parseBenchOptions(argv: string[]): BenchOptions {
  const { values } = parseArgs({
    args: argv,
    options: {
      seconds: { type: 'string' },
      connections: { type: 'string' },
      warmup: { type: 'string' },
      wards: { type: 'string' },
      beds: { type: 'string' },
      active: { type: 'string' },
      days: { type: 'string' },
      factor: { type: 'string' },
      'render-runs': { type: 'string' },
      'no-seed': { type: 'boolean' },
      'no-write': { type: 'boolean' },
      doc: { type: 'string' },
    },
    strict: true,
  });
  const number = (text: string | undefined, name: string, fallback: number, min: number): number => {
    if (text === undefined) return fallback;
    const value = Number(text);
    if (!Number.isFinite(value) || value < min) throw new Error(`--${name} must be a number of at least ${min}, not "${text}"`);
    return value;
  };
  return {
    seconds: number(values.seconds, 'seconds', DEFAULTS.seconds, 1),
    connections: number(values.connections, 'connections', DEFAULTS.connections, 1),
    warmupSeconds: number(values.warmup, 'warmup', DEFAULTS.warmupSeconds, 0),
    wards: number(values.wards, 'wards', DEFAULTS.wards, 1),
    beds: number(values.beds, 'beds', DEFAULTS.beds, 1),
    active: number(values.active, 'active', DEFAULTS.active, 1),
    days: number(values.days, 'days', DEFAULTS.days, 1),
    factor: number(values.factor, 'factor', DEFAULTS.factor, 1),
    seed: !values['no-seed'],
    renderRuns: number(values['render-runs'], 'render-runs', DEFAULTS.renderRuns, 0),
    doc: values['no-write'] ? null : (values.doc ?? DEFAULTS.doc),
  };
}
