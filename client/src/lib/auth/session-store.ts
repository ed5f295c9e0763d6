import { loginResponseSchema, type LoginResponse } from '@lockstep/shared';

/** What a signed-in browser tab holds: the bearer token and who it belongs to. */
export type Session = LoginResponse;

/** `idle`: nobody used the tab for the idle sign-out time (config/env.ts). */
export type SessionEndReason = 'signed-out' | 'expired' | 'idle';

// sessionStorage, not localStorage: ward computers are shared, and closing the tab or browser
// must end the session.
const STORAGE_KEY = 'lockstep.session';

type Listener = () => void;
const listeners = new Set<Listener>();

let current: Session | null | undefined;
let lastEndReason: SessionEndReason | null = null;

function storage(): Storage | null {
  return typeof sessionStorage === 'undefined' ? null : sessionStorage;
}

function readStored(): Session | null {
  const raw = storage()?.getItem(STORAGE_KEY);
  if (!raw) return null;
  try {
    const parsed = loginResponseSchema.safeParse(JSON.parse(raw));
    return parsed.success ? parsed.data : null;
  } catch {
    return null;
  }
}

function emit(): void {
  for (const listener of listeners) listener();
}

/** The current session, or null when nobody is signed in. Stable between changes. */
export function getSession(): Session | null {
  if (current === undefined) current = readStored();
  return current;
}

export function startSession(session: Session): void {
  current = session;
  lastEndReason = null;
  storage()?.setItem(STORAGE_KEY, JSON.stringify(session));
  emit();
}

/** Keeps the stored user in step with the server's answer to /auth/me (name, role, wards). */
export function updateSessionUser(user: Session['user']): void {
  const session = getSession();
  if (!session) return;
  const same =
    session.user.id === user.id &&
    session.user.displayName === user.displayName &&
    session.user.role === user.role &&
    session.user.username === user.username &&
    JSON.stringify(session.user.wards) === JSON.stringify(user.wards);
  if (!same) startSession({ ...session, user });
}

export function endSession(reason: SessionEndReason): void {
  current = null;
  lastEndReason = reason;
  storage()?.removeItem(STORAGE_KEY);
  emit();
}

/** Why the last session ended, so sign-in can say "your session has ended" when it expired. */
export function getLastEndReason(): SessionEndReason | null {
  return lastEndReason;
}

export function subscribeSession(listener: Listener): () => void {
  listeners.add(listener);
  return () => listeners.delete(listener);
}
