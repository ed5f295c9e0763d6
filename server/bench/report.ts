import type { BenchOptions } from './bench-options.js';
import type { Dataset, DatasetFacts } from './datasets.js';
import type { FirstRender } from './first-render.js';
import type { LoadResult } from './load.js';
import type { Machine } from './machine.js';
import type { Percentiles } from './stats.js';

export type BenchReport = {
  startedAt: string;
  machine: Machine;
  options: BenchOptions;
  full: Dataset & { facts: DatasetFacts };
  small: Dataset & { facts: DatasetFacts };
  sameJson: boolean;
  lockstep: { board: LoadResult; orders: LoadResult; usage: LoadResult; writes: LoadResult };
  baseline: LoadResult;
  smallBoard: LoadResult;
  firstRender: FirstRender;
};

export type Verdict = { target: string; measured: string; holds: boolean };

const ms = (value: number) => (Number.isFinite(value) ? value.toFixed(1) : '–');
const trio = (p: Percentiles | null) => (p ? `${ms(p.p50)} / ${ms(p.p95)} / ${ms(p.p99)}` : '–');

export function verdicts(report: BenchReport): Verdict[] {
  const board = report.lockstep.board;
  const boardP95 = board.serverTime?.p95 ?? Number.NaN;
  const share = board.requestsPerSecond / report.baseline.requestsPerSecond;
  const growth = (board.serverTime?.p50 ?? Number.NaN) / (report.smallBoard.serverTime?.p50 ?? Number.NaN);
  const writeP95 = report.lockstep.writes.serverTime?.p95 ?? Number.NaN;
  const c = report.options.connections;
  return [
    { target: `board p95 server time ≤ 10 ms at ${c} connections`, measured: `${ms(boardP95)} ms`, holds: boardP95 <= 10 },
    { target: 'board throughput ≥ 50 % of the baseline', measured: `${(share * 100).toFixed(0)} %`, holds: share >= 0.5 },
    {
      target: `board time on ${report.options.factor}× the data ≤ 1.3× (median server time)`,
      measured: `${growth.toFixed(2)}×`,
      holds: growth <= 1.3,
    },
    { target: 'observation write p95 ≤ 20 ms (server time)', measured: `${ms(writeP95)} ms`, holds: writeP95 <= 20 },
  ];
}

/** The results as Markdown, for docs/performance.md and the console. */
export function renderReport(report: BenchReport): string {
  const { machine, options, full, small } = report;
  const rows: [string, string, LoadResult][] = [
    ['Lockstep', 'full', report.lockstep.board],
    ['baseline (node:http + better-sqlite3)', 'full', report.baseline],
    ['Lockstep', `1/${options.factor}`, report.smallBoard],
    ['Lockstep', 'full', report.lockstep.orders],
    ['Lockstep', 'full', report.lockstep.usage],
    ['Lockstep', 'full', report.lockstep.writes],
  ];
  const render = report.firstRender;
  const lines = [
    `Run ${report.startedAt}; ${options.connections} connections, ${options.seconds} s per measurement after ${options.warmupSeconds} s of warm-up.`,
    '',
    `Machine: ${machine.cpu}, ${machine.cores} cores, ${machine.memoryGb} GB; ${machine.os}; Node ${machine.node}; SQLite ${machine.sqlite}. Load average when the run began: ${machine.loadAverage}. The load generator (autocannon) ran on the same machine.`,
    '',
    '| dataset | wards | beds | active PCAs | patients | orders | observations | written in |',
    '|---|---:|---:|---:|---:|---:|---:|---:|',
    ...[full, small].map(
      (d) =>
        `| ${d.label} | ${d.facts.counts.wards} | ${d.beds} | ${d.facts.activeOrders.length} | ${d.facts.counts.patients.toLocaleString('en-GB')} | ${d.facts.counts.orders.toLocaleString('en-GB')} | ${d.facts.counts.observations.toLocaleString('en-GB')} | ${d.seedSeconds === null ? 'reused' : `${d.seedSeconds.toFixed(1)} s`} |`,
    ),
    '',
    `Busy ward: ${full.facts.busyWard.name} (${full.facts.busyWard.boardRows} rows on its board in both datasets: ${small.facts.busyWard.boardRows} in the small one). The baseline's board is the same JSON as Lockstep's: ${report.sameJson ? 'yes' : 'NO'}.`,
    '',
    '| endpoint | server | data | req/s | latency p50 / p95 / p99 (ms) | server time p50 / p95 / p99 (ms) | non-2xx | errors |',
    '|---|---|---|---:|---|---|---:|---:|',
    ...rows.map(
      ([server, data, r]) =>
        `| ${r.name} | ${server} | ${data} | ${r.requestsPerSecond.toFixed(0)} | ${trio(r.latency)} | ${trio(r.serverTime)} | ${r.non2xx} | ${r.errors} |`,
    ),
    '',
    `Board throughput against the baseline: ${((report.lockstep.board.requestsPerSecond / report.baseline.requestsPerSecond) * 100).toFixed(0)} %. Board median server time, full over 1/${options.factor} data: ${((report.lockstep.board.serverTime?.p50 ?? Number.NaN) / (report.smallBoard.serverTime?.p50 ?? Number.NaN)).toFixed(2)}×.`,
    '',
    'error' in render
      ? `Board first render in headless chromium: not measured (${render.error}).`
      : `Board first render in headless chromium (${full.facts.busyWard.boardRows} rows): ${render.firstMs} ms the first time after signing in (the board's code not yet loaded), median ${render.repeatMedianMs} ms over ${render.repeatMs.length} reloads (${render.repeatMs.join(', ')} ms).`,
    '',
    '| target | measured | holds |',
    '|---|---|---|',
    ...verdicts(report).map((v) => `| ${v.target} | ${v.measured} | ${v.holds ? 'yes' : 'no'} |`),
  ];
  const all = [...Object.values(report.lockstep), report.baseline, report.smallBoard];
  const failures = all.flatMap((r) => [
    ...r.failures.map((failure) => `${r.name}: ${failure}`),
    ...(r.non2xx + r.errors > 0
      ? [`${r.name}: status codes ${JSON.stringify(r.statusCodes)}, ${r.errors} connection errors or timeouts`]
      : []),
  ]);
  if (failures.length > 0) lines.push('', 'Non-2xx answers seen:', ...failures.map((failure) => `- ${failure}`));
  return lines.join('\n');
}
