import { DEMO_PASSWORD } from '../../../server/test/support/demo-accounts.js';

type Method = 'GET' | 'POST' | 'PATCH';

/** The API of the server under test, called outside the browser to set up or read back what a test needs. */
export async function callApi<T>(baseUrl: string, token: string | null, method: Method, route: string, body?: unknown): Promise<T> {
  const response = await fetch(`${baseUrl}/api${route}`, {
    method,
    headers: { 'Content-Type': 'application/json', ...(token ? { Authorization: `Bearer ${token}` } : {}) },
    body: body === undefined ? undefined : JSON.stringify(body),
  });
  const text = await response.text();
  if (!response.ok) throw new Error(`${method} ${route} answered ${response.status}: ${text}`);
  return JSON.parse(text) as T;
}

/** A demo account's access token. */
export async function apiToken(baseUrl: string, username: string): Promise<string> {
  const { accessToken } = await callApi<{ accessToken: string }>(baseUrl, null, 'POST', '/auth/login', {
    username,
    password: DEMO_PASSWORD,
  });
  return accessToken;
}

/** A demo patient's id, found by MRN (ids follow the seed's order; the MRN is what a test names). */
export async function patientIdByMrn(baseUrl: string, token: string, mrn: string): Promise<number> {
  const patients = await callApi<{ id: number; mrn: string }[]>(baseUrl, token, 'GET', '/patients');
  const patient = patients.find((candidate) => candidate.mrn === mrn);
  if (!patient) throw new Error(`No demo patient with MRN ${mrn}`);
  return patient.id;
}
