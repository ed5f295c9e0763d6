import path from 'node:path';
import { existsSync } from 'node:fs';
import { parseBenchOptions } from './bench-options.js';
import { type Dataset, type DatasetSize, datasetSizes, readFacts, writeDataset } from './datasets.js';
import { measureFirstRender } from './first-render.js';
import { type LoadResult, type LoadSpec, runLoad, warmUp } from './load.js';
import { sameBoardAsBaseline, signIn } from './lockstep-api.js';
import { describeMachine } from './machine.js';
import { REPO_ROOT, SERVER_ROOT } from './paths.js';
import { startBaseline, startLockstep } from './processes.js';
import { type BenchReport, renderReport } from './report.js';
import { boardLoad, ordersLoad, usageLoad, writesLoad } from './scenarios.js';
import { writeResults } from './write-doc.js';

/**
 * `npm run bench [-- --seconds 10 --connections 50 --warmup 3 --no-seed --no-write ...]`: writes
 * the scale datasets, then measures the built server on them one process at a time (Lockstep on
 * the full data, the bare baseline on the full data, Lockstep on the data divided by `--factor`),
 * prints the figures and writes them into docs/performance.md.
 */
async function main(): Promise<void> {
  const options = parseBenchOptions(process.argv.slice(2));
  const startedAt = new Date().toISOString();
  const machine = describeMachine();
  const sizes = datasetSizes(options);
  const full = await dataset('full', sizes.full, 'lockstep-scale.sqlite', options.seed);
  const small = await dataset(`1/${options.factor}`, sizes.small, 'lockstep-scale-small.sqlite', options.seed);
  const facts = readFacts(full.file);
  const smallFacts = readFacts(small.file);
  const measure = async (spec: LoadSpec): Promise<LoadResult> => {
    await warmUp(spec, options.warmupSeconds);
    await pause();
    console.log(`Measuring ${spec.name} (${spec.connections} connections, ${spec.seconds} s) ...`);
    const result = await runLoad(spec);
    await pause();
    return result;
  };

  const lockstepServer = await startLockstep(full.file, 'lockstep-full');
  let lockstep: BenchReport['lockstep'];
  let sameJson: boolean;
  let firstRender: BenchReport['firstRender'];
  try {
    const tokens = {
      chargeNurse: await signIn(lockstepServer.baseUrl, 'mei.tan'),
      nurse: await signIn(lockstepServer.baseUrl, 'kai.mendes'),
    };
    const context = { baseUrl: lockstepServer.baseUrl, options, facts, tokens };
    sameJson = await sameBoardAsBaseline(lockstepServer.baseUrl, tokens.chargeNurse, facts.busyWard.id, full.file);
    const board = await measure(boardLoad(context));
    const orders = await measure(ordersLoad(context));
    const usage = await measure(usageLoad(context));
    console.log('Timing the board in headless chromium ...');
    firstRender = await measureFirstRender(
      lockstepServer.baseUrl,
      facts.busyWard.id,
      facts.busyWard.boardRows,
      options.renderRuns,
      'mei.tan',
    );
    const writes = await measure(writesLoad(context));
    lockstep = { board, orders, usage, writes };
  } finally {
    await lockstepServer.stop();
  }

  const baselineServer = await startBaseline(full.file);
  let baseline: LoadResult;
  try {
    baseline = await measure(
      boardLoad({ baseUrl: baselineServer.baseUrl, options, facts, tokens: { chargeNurse: '', nurse: '' } }, 'board'),
    );
  } finally {
    await baselineServer.stop();
  }

  const smallServer = await startLockstep(small.file, 'lockstep-small');
  let smallBoard: LoadResult;
  try {
    const token = await signIn(smallServer.baseUrl, 'mei.tan');
    smallBoard = await measure(
      boardLoad({ baseUrl: smallServer.baseUrl, options, facts: smallFacts, tokens: { chargeNurse: token, nurse: token } }, 'board'),
    );
  } finally {
    await smallServer.stop();
  }

  const report: BenchReport = {
    startedAt,
    machine,
    options,
    full: { ...full, facts },
    small: { ...small, facts: smallFacts },
    sameJson,
    lockstep,
    baseline,
    smallBoard,
    firstRender,
  };
  const markdown = renderReport(report);
  console.log(`\n${markdown}\n`);
  if (options.doc) {
    const doc = path.resolve(REPO_ROOT, options.doc);
    writeResults(doc, markdown);
    console.log(`Written into ${doc}`);
  }
}

async function dataset(label: string, size: DatasetSize, name: string, seed: boolean): Promise<Dataset> {
  const file = path.join(SERVER_ROOT, 'data', name);
  if (!seed && existsSync(file)) return { ...size, label, file, seedSeconds: null };
  console.log(`Writing the ${label} dataset (${size.wards} wards, ${size.beds} beds, ${size.active} active PCAs, ${size.days} days) ...`);
  return { ...size, label, file, seedSeconds: await writeDataset(size, file) };
}

/** Lets answers still in flight from the last load finish before the next one starts. */
function pause(): Promise<void> {
  return new Promise((resolve) => setTimeout(resolve, 1000));
}

main().catch((error: unknown) => {
  console.error(error instanceof Error ? (error.stack ?? error.message) : error);
  process.exit(1);
});
