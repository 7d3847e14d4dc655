import { readJson, storageKey, writeJson } from './device-storage';

/** The load size (loose yd³) this phone's user last saved a log with: usually their own truck's. */
const key = (userId: string) => storageKey('load-size', userId);

export function readLoadVolume(userId: string): string | null {
  const value = readJson<unknown>(key(userId));
  return typeof value === 'string' && value !== '' ? value : null;
}

/** A convenience only: a full phone keeps the log, not the remembered size. */
export function rememberLoadVolume(userId: string, loadVolume: string): void {
  try {
    writeJson(key(userId), loadVolume);
  } catch {
    // Nothing to do: the crew types the size again next time.
  }
}
