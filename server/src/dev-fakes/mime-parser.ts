// Enough of MIME to show a message nodemailer sent: the text and HTML bodies and the attachments of
// multipart/alternative, /mixed and /related messages in base64, quoted-printable or 7/8-bit.
import addressparser from 'nodemailer/lib/addressparser';
import {
  decodeBytes,
  decodeEncodedWords,
  firstHeader,
  parseHeaders,
  parseParameterized,
  splitEntity,
} from './mime-headers';

export type ParsedMail = {
  subject: string;
  from: string;
  /** Bare addresses from the To header. */
  to: string[];
  messageId: string | null;
  text: string;
  html: string | null;
  attachments: Array<{ filename: string; contentType: string; size: number }>;
};

type Leaf = {
  contentType: string;
  charset: string;
  isAttachment: boolean;
  filename: string | null;
  content: Buffer;
};

export function parseMail(raw: Buffer): ParsedMail {
  const { headerText } = splitEntity(raw);
  const headers = parseHeaders(headerText);
  const texts: string[] = [];
  const htmls: string[] = [];
  const attachments: ParsedMail['attachments'] = [];
  for (const leaf of collectLeaves(raw)) {
    const isBody =
      !leaf.isAttachment && (leaf.contentType === 'text/plain' || leaf.contentType === 'text/html');
    if (isBody) {
      const decoded = decodeBytes(leaf.content, leaf.charset).replace(/\r\n/g, '\n');
      (leaf.contentType === 'text/html' ? htmls : texts).push(decoded);
    } else {
      attachments.push({
        filename: leaf.filename ?? 'attachment',
        contentType: leaf.contentType,
        size: leaf.content.length,
      });
    }
  }
  return {
    subject: decodeEncodedWords(firstHeader(headers, 'subject') ?? ''),
    from: decodeEncodedWords(firstHeader(headers, 'from') ?? ''),
    to: addressesOf((headers.get('to') ?? []).join(', ')),
    messageId: firstHeader(headers, 'message-id') ?? null,
    text: texts.join('\n'),
    html: htmls.length > 0 ? htmls.join('\n') : null,
    attachments,
  };
}

function addressesOf(header: string): string[] {
  if (!header.trim()) return [];
  return addressparser(header, { flatten: true })
    .map((entry) => entry.address ?? '')
    .filter((address) => address.length > 0);
}

/** Walks the entity tree depth-first, in document order, returning the non-multipart entities. */
function collectLeaves(entity: Buffer, depth = 0): Leaf[] {
  const { headerText, body } = splitEntity(entity);
  const headers = parseHeaders(headerText);
  const type = parseParameterized(firstHeader(headers, 'content-type') ?? 'text/plain');
  const boundary = type.params['boundary'];
  if (type.value.startsWith('multipart/') && boundary) {
    return splitMultipart(body, boundary).flatMap((part) => collectLeaves(part, depth + 1));
  }
  const disposition = parseParameterized(firstHeader(headers, 'content-disposition'));
  const encoding = (firstHeader(headers, 'content-transfer-encoding') ?? '7bit').toLowerCase();
  return [
    {
      contentType: type.value || 'text/plain',
      charset: type.params['charset'] ?? 'utf-8',
      isAttachment: disposition.value === 'attachment',
      filename: disposition.params['filename'] ?? type.params['name'] ?? null,
      // A single-part message's last line break ends the message, not the text (in a multipart one
      // it belongs to the boundary, which splitMultipart already removed).
      content: decodeTransfer(depth === 0 ? withoutFinalLineBreak(body) : body, encoding),
    },
  ];
}

/**
 * Cuts a multipart body at its boundary lines (RFC 2046 §5.1.1). The line break before a boundary
 * belongs to the boundary; the preamble before the first and the epilogue after the last are dropped.
 */
export function splitMultipart(body: Buffer, boundary: string): Buffer[] {
  const text = body.toString('latin1');
  const delimiter = `--${boundary}`;
  const parts: Buffer[] = [];
  let partStart: number | null = null;
  let searchFrom = 0;
  while (searchFrom <= text.length) {
    const at = text.indexOf(delimiter, searchFrom);
    if (at < 0) break;
    searchFrom = at + delimiter.length;
    if (at > 0 && text[at - 1] !== '\n') continue; // not at the start of a line
    if (!/^(--|[ \t\r\n]|$)/.test(text.slice(searchFrom, searchFrom + 2))) continue; // a longer token
    if (partStart !== null) {
      const end = text[at - 2] === '\r' ? at - 2 : at - 1;
      parts.push(body.subarray(partStart, Math.max(partStart, end)));
    }
    if (text.startsWith('--', searchFrom)) return parts; // the closing delimiter
    const lineEnd = text.indexOf('\n', searchFrom);
    if (lineEnd < 0) return parts;
    partStart = lineEnd + 1;
    searchFrom = partStart;
  }
  // No closing delimiter: keep what was opened, as a lenient reader would.
  if (partStart !== null && partStart < body.length) parts.push(body.subarray(partStart));
  return parts;
}

function withoutFinalLineBreak(body: Buffer): Buffer {
  const length = body.length;
  if (body[length - 1] !== 0x0a) return body;
  return body.subarray(0, body[length - 2] === 0x0d ? length - 2 : length - 1);
}

export function decodeTransfer(body: Buffer, encoding: string): Buffer {
  if (encoding === 'base64') return Buffer.from(body.toString('latin1'), 'base64');
  if (encoding === 'quoted-printable') return decodeQuotedPrintable(body.toString('latin1'));
  return body;
}

/** RFC 2045 §6.7: "=" at a line end is a soft break; =XX is one byte. */
export function decodeQuotedPrintable(text: string): Buffer {
  const binary = text
    .replace(/[ \t]+(?=\r?\n)/g, '') // trailing whitespace was added in transport
    .replace(/=\r?\n/g, '')
    .replace(/=([0-9A-Fa-f]{2})/g, (_, hex: string) => String.fromCharCode(parseInt(hex, 16)));
  return Buffer.from(binary, 'latin1');
}
