import { execFile } from 'node:child_process';
import { copyFileSync, existsSync, mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { fileURLToPath } from 'node:url';
import { promisify } from 'node:util';
import Database from 'better-sqlite3';
import { afterAll, describe, expect, it } from 'vitest';
import { backupDatabase } from '../src/database/backup.js';
import { DEMO_PASSWORD } from './support/demo-accounts.js';
import { CALM_OBSERVATION as OBSERVATION, FREE_PATIENT, ORDER, RELEASE, ROSA, SETTINGS } from './support/pca.js';
import { startBuiltServer } from './support/server-process.js';
import type { SpawnedServer } from './support/spawn-server.js';

// The real built server as a child process, killed with SIGKILL while observation writes are in
// flight and restarted on the same file. Run by `npm run test:crash` after the build. The PCA and
// its calm observations are support/pca.ts's, plain data: the app is only ever reached over HTTP.
const CYCLES = 5;
const WORKERS = 8;

type Json = Record<string, unknown>;

async function api<T = Json>(
  baseUrl: string,
  method: string,
  route: string,
  token: string | null,
  body: object | undefined,
  expected: number,
): Promise<T> {
  const response = await fetch(`${baseUrl}/api${route}`, {
    method,
    headers: { ...(token ? { Authorization: `Bearer ${token}` } : {}), ...(body ? { 'Content-Type': 'application/json' } : {}) },
    body: body ? JSON.stringify(body) : undefined,
  });
  const text = await response.text();
  if (response.status !== expected) throw new Error(`${method} ${route}: ${response.status} instead of ${expected}: ${text}`);
  return (text ? JSON.parse(text) : {}) as T;
}

const signIn = async (baseUrl: string, username: string): Promise<string> =>
  (await api<{ accessToken: string }>(baseUrl, 'POST', '/auth/login', null, { username, password: DEMO_PASSWORD }, 200)).accessToken;

/**
 * Signed, verified, a syringe released and a matching two-nurse check: an active PCA, for the demo
 * patient with no PCA (a patient may have only one open PCA; patient 1 has the demo's order).
 */
async function activePca(baseUrl: string): Promise<number> {
  const [prescriber, pharmacist, nurse] = await Promise.all(
    ['amara.osei', 'lin.park', 'kai.mendes'].map((username) => signIn(baseUrl, username)),
  );
  const patients = await api<{ id: number; mrn: string }[]>(baseUrl, 'GET', '/patients', prescriber, undefined, 200);
  const patientId = patients.find((patient) => patient.mrn === FREE_PATIENT.identity.patientMrn)!.id;
  const { id } = await api(baseUrl, 'POST', '/orders', prescriber, { ...ORDER, patientId }, 201);
  await api(baseUrl, 'POST', `/orders/${id}/verify`, pharmacist, { signature: { password: DEMO_PASSWORD } }, 200);
  const { releaseCode } = await api(baseUrl, 'POST', `/orders/${id}/releases`, pharmacist, RELEASE, 201);
  const first = await api(
    baseUrl,
    'POST',
    `/orders/${id}/bedside-checks`,
    nurse,
    { ...FREE_PATIENT.identity, releaseCode, settings: SETTINGS },
    201,
  );
  await api(baseUrl, 'POST', `/orders/${id}/bedside-checks/${first.id}/second`, nurse, { ...ROSA, settings: SETTINGS }, 200);
  return id as number;
}

type Burst = { inFlightAtStop: number; cutOff: number };

/**
 * WORKERS requests at a time, each worker sending its next as soon as its last is answered. Once
 * `stopWhen()` holds after an answer, `stop` runs `stopDelayMs` later, with requests in flight.
 * Ids go into `answered` only for a 201 whose body (and so the new id) fully arrived.
 */
async function burst(
  baseUrl: string,
  orderId: number,
  token: string,
  answered: number[],
  stopWhen: () => boolean,
  stop: () => Promise<void>,
  stopDelayMs = 0,
): Promise<Burst> {
  let inFlight = 0;
  let inFlightAtStop = 0;
  let cutOff = 0;
  let stopping: Promise<void> | null = null;
  let scheduled = false;
  const worker = async () => {
    while (!stopping) {
      inFlight++;
      try {
        const response = await fetch(`${baseUrl}/api/orders/${orderId}/observations`, {
          method: 'POST',
          headers: { Authorization: `Bearer ${token}`, 'Content-Type': 'application/json' },
          body: JSON.stringify(OBSERVATION),
        });
        const body = (await response.json()) as Json;
        if (response.status === 201) answered.push(body.id as number);
        else if (response.status === 429) await new Promise((resolve) => setTimeout(resolve, 50));
        else throw new Error(`POST observations: ${response.status} ${JSON.stringify(body)}`);
      } catch (error) {
        if (!stopping) throw error;
        cutOff++;
      } finally {
        inFlight--;
      }
      if (!scheduled && stopWhen()) {
        scheduled = true;
        setTimeout(() => {
          inFlightAtStop = inFlight;
          stopping = stop();
        }, stopDelayMs);
      }
    }
  };
  await Promise.all(Array.from({ length: WORKERS }, worker));
  await stopping;
  return { inFlightAtStop, cutOff };
}

function openReadOnly(file: string) {
  return new Database(file, { readonly: true, fileMustExist: true });
}

function storedObservationIds(file: string, orderId: number): { integrity: unknown; foreignKeyProblems: unknown[]; ids: Set<number> } {
  const db = openReadOnly(file);
  try {
    return {
      integrity: db.pragma('integrity_check', { simple: true }),
      foreignKeyProblems: db.pragma('foreign_key_check') as unknown[],
      ids: new Set(db.prepare('SELECT id FROM observations WHERE orderId = ?').pluck().all(orderId) as number[]),
    };
  } finally {
    db.close();
  }
}

// One server and one database file through all three tests, in order: the backup test writes
// into the file the kills left behind, and the restore test restores that backup.
describe('crash safety of the built server', () => {
  const directory = mkdtempSync(path.join(tmpdir(), 'lockstep-crash-'));
  const databasePath = path.join(directory, 'crash.sqlite');
  let server: SpawnedServer | undefined;
  let orderId = 0;
  const answered: number[] = [];
  let cliBackup = '';

  afterAll(async () => {
    await server?.stop();
    rmSync(directory, { recursive: true, force: true });
  });

  it(`keeps every answered observation and an intact file through ${CYCLES} SIGKILLs mid-burst`, async () => {
    server = await startBuiltServer(databasePath);
    orderId = await activePca(server.baseUrl);
    const cycles: string[] = [];

    for (let cycle = 1; cycle <= CYCLES; cycle++) {
      const running: SpawnedServer = server;
      const nurse = await signIn(running.baseUrl, 'kai.mendes');
      const thisBurst: number[] = [];
      const killAfter = 10 + Math.floor(Math.random() * 40);
      // A random delay after the trigger (a request takes tens of milliseconds here) lands the
      // kill at varied points of the server's handling of one.
      const started = performance.now();
      const result = await burst(
        running.baseUrl,
        orderId,
        nurse,
        thisBurst,
        () => thisBurst.length >= killAfter,
        running.kill,
        Math.random() * 200,
      );
      const msPerWrite = Math.round((performance.now() - started) / thisBurst.length);
      expect(result.inFlightAtStop, 'requests still in flight when the server was killed').toBeGreaterThan(0);
      answered.push(...thisBurst);

      server = await startBuiltServer(databasePath);
      const stored = storedObservationIds(databasePath, orderId);
      expect(stored.integrity).toBe('ok');
      expect(stored.foreignKeyProblems).toEqual([]);
      expect(
        answered.filter((id) => !stored.ids.has(id)),
        'answered 201 but missing after the restart',
      ).toEqual([]);
      const listed = await api<{ id: number }[]>(server.baseUrl, 'GET', `/orders/${orderId}/observations`, nurse, undefined, 200);
      expect(listed.map((observation) => observation.id).sort((a, b) => a - b)).toEqual([...stored.ids].sort((a, b) => a - b));
      const chain = await api(server.baseUrl, 'GET', '/audit/verify', await signIn(server.baseUrl, 'sam.rivera'), undefined, 200);
      expect(chain, 'the audit chain after the restart').toMatchObject({ ok: true, firstBadId: null });
      cycles.push(
        `cycle ${cycle}: killed after ${thisBurst.length} answered writes (~${msPerWrite} ms each) with ${result.inFlightAtStop} in flight (${result.cutOff} cut off); ` +
          `${stored.ids.size} stored, ${stored.ids.size - answered.length} of them committed but never answered; audit chain of ${chain.checked} events intact`,
      );
    }
    console.log(`Crash safety, ${CYCLES} SIGKILL cycles survived:\n  ${cycles.join('\n  ')}`);
  });

  it('backs up online from another process while the server writes; `db:backup` does the same', async () => {
    const running = server!;
    const nurse = await signIn(running.baseUrl, 'kai.mendes');
    const backups = path.join(directory, 'backups');
    const during: number[] = [];
    let answeredWhenDone = -1;
    const copy = (async () => {
      while (during.length < 10) await new Promise((resolve) => setTimeout(resolve, 5));
      const answeredBefore = [...during];
      const { file } = await backupDatabase(databasePath, backups);
      answeredWhenDone = during.length;
      return { file, answeredBefore };
    })();
    // The writes go on until 2 × WORKERS more were answered after the copy was done: at least
    // WORKERS of those were sent after it, so they cannot be in it.
    await burst(
      running.baseUrl,
      orderId,
      nurse,
      during,
      () => answeredWhenDone >= 0 && during.length >= answeredWhenDone + 2 * WORKERS,
      async () => undefined,
    );
    const { file, answeredBefore } = await copy;

    const backup = openReadOnly(file);
    try {
      expect(backup.pragma('integrity_check', { simple: true })).toBe('ok');
      const ids = new Set(backup.prepare('SELECT id FROM observations WHERE orderId = ?').pluck().all(orderId) as number[]);
      expect(
        [...answered, ...answeredBefore].filter((id) => !ids.has(id)),
        'answered before the backup began but not in it',
      ).toEqual([]);
      expect(during.filter((id) => !ids.has(id)).length, 'writes sent after the backup was taken').toBeGreaterThanOrEqual(WORKERS);
    } finally {
      backup.close();
    }

    const cli = await promisify(execFile)(process.execPath, [path.join('dist', 'database', 'backup-cli.js')], {
      cwd: fileURLToPath(new URL('..', import.meta.url)),
      env: { ...process.env, DATABASE_PATH: databasePath, BACKUP_DIR: backups },
    });
    const printed = /^Backed up .+ to (.+lockstep-[\dTZ-]+\.sqlite) \((\d+) KiB\)\.$/m.exec(cli.stdout);
    expect(printed, cli.stdout + cli.stderr).not.toBeNull();
    expect(existsSync(printed![1])).toBe(true);
    cliBackup = printed![1];
    const fromCli = openReadOnly(cliBackup);
    try {
      expect(fromCli.pragma('integrity_check', { simple: true })).toBe('ok');
      expect(
        (fromCli.prepare('SELECT COUNT(*) AS n FROM observations WHERE orderId = ?').get(orderId) as { n: number }).n,
      ).toBeGreaterThanOrEqual(answered.length + during.length);
    } finally {
      fromCli.close();
    }
  });

  it('restores a backup as docs/operations.md says: stop, copy over DATABASE_PATH, remove -wal and -shm, start', async () => {
    const backup = openReadOnly(cliBackup);
    const backedUp = backup.prepare('SELECT id FROM observations WHERE orderId = ? ORDER BY id').pluck().all(orderId) as number[];
    backup.close();
    const nurse = await signIn(server!.baseUrl, 'kai.mendes');
    await api(server!.baseUrl, 'POST', `/orders/${orderId}/observations`, nurse, OBSERVATION, 201);

    await server!.stop();
    copyFileSync(cliBackup, databasePath);
    for (const suffix of ['-wal', '-shm']) rmSync(databasePath + suffix, { force: true });
    server = await startBuiltServer(databasePath);

    const listed = await api<{ id: number }[]>(server.baseUrl, 'GET', `/orders/${orderId}/observations`, nurse, undefined, 200);
    expect(listed.map((observation) => observation.id)).toEqual(backedUp);
    const chain = await api(server.baseUrl, 'GET', '/audit/verify', await signIn(server.baseUrl, 'sam.rivera'), undefined, 200);
    expect(chain).toMatchObject({ ok: true, firstBadId: null });
    expect(storedObservationIds(databasePath, orderId).integrity).toBe('ok');
  });
});
