import { NetworkError } from '@/lib/api-error';
import { readJson, storageKey, writeJson } from '../storage/device-storage';

export type Copied<T> = {
  data: T;
  /** When the phone last got this from the server; null when it just did. */
  copiedAt: string | null;
};

/**
 * Loads from the server and keeps a copy on the phone; with no connection, answers with that copy.
 * On site the signal comes and goes, and the query cache forgets pages a few minutes after they close.
 */
export async function withDeviceCopy<T>(
  userId: string,
  name: string,
  load: () => Promise<T>,
): Promise<Copied<T>> {
  const key = storageKey('copy', userId, name);
  try {
    const data = await load();
    try {
      writeJson(key, { data, copiedAt: new Date().toISOString() });
    } catch {
      // A full phone still shows the fresh answer; it just has no copy for later.
    }
    return { data, copiedAt: null };
  } catch (error) {
    const copy = error instanceof NetworkError ? readJson<Copied<T>>(key) : null;
    if (copy) return copy;
    throw error;
  }
}
