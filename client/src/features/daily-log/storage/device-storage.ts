/**
 * The phone's own storage for the daily log: localStorage, behind four small functions so the outbox
 * could move to IndexedDB without touching its callers. localStorage is synchronous, so "written to the
 * phone" is true the moment `writeJson` returns, before any request starts; a log is a few kilobytes,
 * far below the quota.
 */
const PREFIX = 'pondwright.daily-log.';

export function storageKey(...parts: string[]): string {
  return PREFIX + parts.join('.');
}

export function readJson<T>(key: string): T | null {
  const raw = window.localStorage.getItem(key);
  if (raw === null) return null;
  try {
    return JSON.parse(raw) as T;
  } catch {
    // A half-written or foreign value is not ours to interpret; leave it for a person to notice.
    return null;
  }
}

/** Throws when the phone's storage is full or switched off, so a save never claims to be kept when it is not. */
export function writeJson(key: string, value: unknown): void {
  window.localStorage.setItem(key, JSON.stringify(value));
}

export function removeKey(key: string): void {
  window.localStorage.removeItem(key);
}

/** Every key under a prefix, with its raw text (the raw text lets a caller tell "nothing changed" cheaply). */
export function entriesUnder(prefix: string): Array<[key: string, raw: string]> {
  const found: Array<[string, string]> = [];
  for (let index = 0; index < window.localStorage.length; index += 1) {
    const key = window.localStorage.key(index);
    if (key?.startsWith(prefix)) found.push([key, window.localStorage.getItem(key) ?? '']);
  }
  return found.sort(([a], [b]) => a.localeCompare(b));
}
