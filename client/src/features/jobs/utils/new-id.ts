/**
 * A v4 uuid made on this device, so a photo keeps one id however often its upload is tried.
 * `crypto.randomUUID` exists only on secure pages (https or localhost); a phone trying the app over
 * the office network on plain http still has `getRandomValues`, so the uuid is built from that.
 * (The daily log has the same helper; features do not import each other.)
 */
export function newId(): string {
  if (typeof crypto.randomUUID === 'function') return crypto.randomUUID();
  const bytes = crypto.getRandomValues(new Uint8Array(16));
  bytes[6] = (bytes[6]! & 0x0f) | 0x40;
  bytes[8] = (bytes[8]! & 0x3f) | 0x80;
  const hex = Array.from(bytes, (byte) => byte.toString(16).padStart(2, '0')).join('');
  return `${hex.slice(0, 8)}-${hex.slice(8, 12)}-${hex.slice(12, 16)}-${hex.slice(16, 20)}-${hex.slice(20)}`;
}
