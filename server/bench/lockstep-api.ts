import { isDeepStrictEqual } from 'node:util';
import Database from 'better-sqlite3';
import type { HandoverBoard } from '@lockstep/shared';
import { BaselineBoard } from './baseline-board.js';

/** Signs in once (sign-in is rate-limited per address) and returns the bearer token. */
export async function signIn(baseUrl: string, username: string): Promise<string> {
  const response = await fetch(`${baseUrl}/api/auth/login`, {
    method: 'POST',
    headers: { 'content-type': 'application/json' },
    body: JSON.stringify({ username, password: 'lockstep-demo' }),
  });
  if (!response.ok) throw new Error(`Sign-in as ${username} answered ${response.status}: ${await response.text()}`);
  return ((await response.json()) as { accessToken: string }).accessToken;
}

/** Lockstep's board and the baseline's for the same moment (Lockstep's generatedAt) are equal. */
export async function sameBoardAsBaseline(baseUrl: string, token: string, wardId: number, file: string): Promise<boolean> {
  const response = await fetch(`${baseUrl}/api/wards/${wardId}/handover`, { headers: { authorization: `Bearer ${token}` } });
  if (!response.ok) throw new Error(`The board answered ${response.status}: ${await response.text()}`);
  const lockstep = (await response.json()) as HandoverBoard;
  const db = new Database(file, { readonly: true });
  try {
    const baseline = new BaselineBoard(db).board(wardId, new Date(lockstep.generatedAt));
    return isDeepStrictEqual(lockstep, JSON.parse(JSON.stringify(baseline)));
  } finally {
    db.close();
  }
}
