// Header-level MIME decoding for the fake SMTP server: folded headers, RFC 2047 encoded words
// ("=?UTF-8?Q?...?=") and parameters, including RFC 2231 continuations (filename*0*=utf-8''...).
// It covers what nodemailer writes; it is not a general-purpose mail parser.

export type Headers = Map<string, string[]>;

export type ParameterizedValue = { value: string; params: Record<string, string> };

/** Splits an entity at the first blank line; an entity without one is all headers. */
export function splitEntity(raw: Buffer): { headerText: string; body: Buffer } {
  const text = raw.toString('latin1');
  const match = /\r?\n\r?\n/.exec(text);
  if (!match) return { headerText: decodeBytes(raw, 'utf-8'), body: Buffer.alloc(0) };
  return {
    // RFC 6532 allows raw UTF-8 in headers; plain ASCII decodes the same either way.
    headerText: decodeBytes(raw.subarray(0, match.index), 'utf-8'),
    body: raw.subarray(match.index + match[0].length),
  };
}

/** Unfolds and collects headers by lower-cased name, keeping repeats in order. */
export function parseHeaders(headerText: string): Headers {
  const headers: Headers = new Map();
  const unfolded = headerText.replace(/\r?\n(?=[ \t])/g, '');
  for (const line of unfolded.split(/\r?\n/)) {
    const colon = line.indexOf(':');
    if (colon <= 0) continue;
    const name = line.slice(0, colon).trim().toLowerCase();
    const values = headers.get(name) ?? [];
    values.push(line.slice(colon + 1).trim());
    headers.set(name, values);
  }
  return headers;
}

export function firstHeader(headers: Headers, name: string): string | undefined {
  return headers.get(name)?.[0];
}

/** Decodes bytes in a declared charset; an unknown label falls back to UTF-8 rather than failing. */
export function decodeBytes(bytes: Uint8Array, charset: string): string {
  const label = charset.trim().toLowerCase() || 'utf-8';
  try {
    return new TextDecoder(label === 'us-ascii' ? 'utf-8' : label).decode(bytes);
  } catch {
    return new TextDecoder('utf-8').decode(bytes);
  }
}

const ENCODED_WORD = /=\?([^?\s]+)\?([BbQq])\?([^?\s]*)\?=/g;

/**
 * Decodes RFC 2047 encoded words. Adjacent words are decoded together, as bytes, because an encoder
 * may split one multi-byte character across two words; the whitespace between them is not text.
 */
export function decodeEncodedWords(value: string): string {
  let result = '';
  let pending: { charset: string; bytes: Buffer[] } | null = null;
  let last = 0;
  const flush = () => {
    if (pending) result += decodeBytes(Buffer.concat(pending.bytes), pending.charset);
    pending = null;
  };
  for (const match of value.matchAll(ENCODED_WORD)) {
    const between = value.slice(last, match.index);
    if (!(pending && /^[ \t\r\n]*$/.test(between))) {
      flush();
      result += between;
    }
    const charset = (match[1] ?? '').split('*')[0] ?? ''; // RFC 2231 allows "charset*language"
    const bytes = decodeWordBytes(match[2] ?? 'Q', match[3] ?? '');
    if (pending && pending.charset.toLowerCase() === charset.toLowerCase()) {
      pending.bytes.push(bytes);
    } else {
      flush();
      pending = { charset, bytes: [bytes] };
    }
    last = match.index + match[0].length;
  }
  flush();
  return result + value.slice(last);
}

function decodeWordBytes(encoding: string, text: string): Buffer {
  if (encoding.toUpperCase() === 'B') return Buffer.from(text, 'base64');
  // The "Q" encoding: underscores are spaces, =XX are bytes.
  return Buffer.from(
    text
      .replace(/_/g, ' ')
      .replace(/=([0-9A-Fa-f]{2})/g, (_, hex: string) => String.fromCharCode(parseInt(hex, 16))),
    'latin1',
  );
}

/** Parses `value; name=token; name="quoted"` (Content-Type, Content-Disposition). */
export function parseParameterized(header: string | undefined): ParameterizedValue {
  const [value = '', ...rawParams] = splitOutsideQuotes(header ?? '', ';');
  const simple: Record<string, string> = {};
  const continued = new Map<string, Array<{ index: number; encoded: boolean; text: string }>>();
  for (const rawParam of rawParams) {
    const equals = rawParam.indexOf('=');
    if (equals <= 0) continue;
    const key = rawParam.slice(0, equals).trim().toLowerCase();
    const text = unquote(rawParam.slice(equals + 1).trim());
    const extended = /^([^*]+)\*(?:(\d+)\*?)?$/.exec(key);
    if (!extended) {
      simple[key] = decodeEncodedWords(text);
      continue;
    }
    const [, base = key, index] = extended;
    const segments = continued.get(base) ?? [];
    segments.push({ index: Number(index ?? 0), encoded: key.endsWith('*'), text });
    continued.set(base, segments);
  }
  const params = { ...simple };
  for (const [name, segments] of continued) params[name] = joinContinuations(segments);
  return { value: value.trim().toLowerCase(), params };
}

/** RFC 2231: segments in index order; `*`-marked ones are %XX-encoded, the first names the charset. */
function joinContinuations(segments: Array<{ index: number; encoded: boolean; text: string }>) {
  segments.sort((a, b) => a.index - b.index);
  let charset = 'utf-8';
  const bytes: Buffer[] = [];
  for (const segment of segments) {
    let text = segment.text;
    if (segment.encoded && segment.index === 0) {
      const parts = /^([^']*)'[^']*'(.*)$/s.exec(text);
      if (parts) {
        charset = parts[1] || charset;
        text = parts[2] ?? '';
      }
    }
    bytes.push(
      segment.encoded
        ? Buffer.from(
            text.replace(/%([0-9A-Fa-f]{2})/g, (_, hex: string) =>
              String.fromCharCode(parseInt(hex, 16)),
            ),
            'latin1',
          )
        : Buffer.from(text, 'utf-8'),
    );
  }
  return decodeBytes(Buffer.concat(bytes), charset);
}

function splitOutsideQuotes(text: string, separator: string): string[] {
  const parts: string[] = [];
  let current = '';
  let quoted = false;
  for (let i = 0; i < text.length; i++) {
    const char = text[i] ?? '';
    if (char === '\\' && quoted) {
      current += char + (text[i + 1] ?? '');
      i++;
    } else if (char === '"') {
      quoted = !quoted;
      current += char;
    } else if (char === separator && !quoted) {
      parts.push(current);
      current = '';
    } else {
      current += char;
    }
  }
  parts.push(current);
  return parts;
}

function unquote(text: string): string {
  if (text.length >= 2 && text.startsWith('"') && text.endsWith('"')) {
    return text.slice(1, -1).replace(/\\(.)/g, '$1');
  }
  return text;
}
