import type { CurrentUser } from '@pondwright/shared';
import { useSyncExternalStore } from 'react';

/**
 * Who was last signed in on this device, so that Pondwright can open in a backyard with no signal.
 *
 * The access token lives only in memory and the refresh cookie needs the server, so a reload with no
 * connection cannot restore a session. Instead the app opens "offline" as the remembered person: the
 * daily log then works from the copies it keeps on the device, and nothing reaches the server until the
 * connection returns and the refresh cookie proves the session is still good. The copy holds who the
 * person is (name, e-mail, role, company), never a token; it is dropped whenever the server says there
 * is no session, and on signing out.
 */
const REMEMBERED_USER_KEY = 'pondwright.session.user';

export function rememberSignedInUser(user: CurrentUser): void {
  try {
    window.localStorage.setItem(REMEMBERED_USER_KEY, JSON.stringify(user));
  } catch {
    // Storage full or switched off: the app still works online, it just cannot open offline.
  }
}

export function forgetSignedInUser(): void {
  try {
    window.localStorage.removeItem(REMEMBERED_USER_KEY);
  } catch {
    // Nothing was kept if storage is unavailable.
  }
}

function isCurrentUser(value: unknown): value is CurrentUser {
  if (typeof value !== 'object' || value === null) return false;
  const user = value as Record<string, unknown>;
  return ['id', 'email', 'name', 'role', 'companyId', 'companyName'].every(
    (field) => typeof user[field] === 'string',
  );
}

export function rememberedUser(): CurrentUser | null {
  try {
    const raw = window.localStorage.getItem(REMEMBERED_USER_KEY);
    const parsed: unknown = raw === null ? null : JSON.parse(raw);
    return isCurrentUser(parsed) ? parsed : null;
  } catch {
    return null;
  }
}

// Whether this page opened from the remembered user rather than a live session.
let openedOffline = false;
const listeners = new Set<() => void>();

export function setOpenedOffline(value: boolean): void {
  if (openedOffline === value) return;
  openedOffline = value;
  listeners.forEach((listener) => listener());
}

function subscribe(listener: () => void): () => void {
  listeners.add(listener);
  return () => listeners.delete(listener);
}

const isOpenedOffline = () => openedOffline;

/** True while the app runs from the remembered user, with no session on the server yet. */
export function useOpenedOffline(): boolean {
  return useSyncExternalStore(subscribe, isOpenedOffline, isOpenedOffline);
}
