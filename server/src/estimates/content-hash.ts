import { createHash } from 'node:crypto';

/**
 * JSON with every object's keys sorted (by UTF-16 code unit, as `Array.prototype.sort` does), arrays in
 * order and no white space, so the same content always gives the same text however PostgreSQL's jsonb
 * or a client happens to order the keys. `undefined` members are left out, as `JSON.stringify` does.
 */
export function canonicalJson(value: unknown): string {
  return JSON.stringify(sortKeys(value));
}

function sortKeys(value: unknown): unknown {
  if (Array.isArray(value)) return value.map(sortKeys);
  if (value !== null && typeof value === 'object') {
    const entries = Object.entries(value as Record<string, unknown>)
      .filter(([, member]) => member !== undefined)
      .sort(([a], [b]) => (a < b ? -1 : a > b ? 1 : 0));
    return Object.fromEntries(entries.map(([key, member]) => [key, sortKeys(member)]));
  }
  return value;
}

/**
 * The fingerprint of a finalised version: SHA-256 (hex) of the UTF-8 bytes of
 * `canonicalJson({ content, computed })`. Anyone holding a version can recompute it.
 */
export function versionSha256(content: unknown, computed: unknown): string {
  return createHash('sha256').update(canonicalJson({ content, computed }), 'utf8').digest('hex');
}
