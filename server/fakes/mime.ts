/**
 * Just enough MIME to read back what nodemailer sends: unfolded headers with RFC 2047 encoded
 * words, nested multiparts (RFC 2046), and base64 or quoted-printable bodies (RFC 2045). Bodies are
 * handled as latin1 strings so every byte survives until its charset is applied.
 */

export interface ParsedMail {
  headers: Map<string, string>;
  text: string | null;
  html: string | null;
}

function decodeBytes(bytes: Buffer, charset = 'utf-8'): string {
  try {
    return new TextDecoder(charset).decode(bytes);
  } catch {
    return new TextDecoder('utf-8').decode(bytes);
  }
}

function quotedPrintableBytes(text: string): Buffer {
  return Buffer.from(text.replace(/=([0-9a-f]{2})/gi, (_, hex: string) => String.fromCharCode(parseInt(hex, 16))), 'latin1');
}

export function decodeWords(value: string): string {
  return value
    .replace(/(\?=)\s+(=\?)/g, '$1$2')
    .replace(/=\?([^?]+)\?([bq])\?([^?]*)\?=/gi, (_, charset: string, kind: string, text: string) =>
      decodeBytes(kind.toLowerCase() === 'b' ? Buffer.from(text, 'base64') : quotedPrintableBytes(text.replace(/_/g, ' ')), charset),
    );
}

function splitHead(entity: string): { headers: Map<string, string>; body: string } {
  const gap = /\r?\n\r?\n/.exec(entity);
  const head = gap ? entity.slice(0, gap.index) : entity;
  const headers = new Map<string, string>();
  for (const line of head.replace(/\r?\n[ \t]+/g, ' ').split(/\r?\n/)) {
    const colon = line.indexOf(':');
    const key = line.slice(0, colon).trim().toLowerCase();
    if (colon > 0 && !headers.has(key)) headers.set(key, line.slice(colon + 1).trim());
  }
  return { headers, body: gap ? entity.slice(gap.index + gap[0].length) : '' };
}

function param(header: string, name: string): string | undefined {
  const match = new RegExp(`;\\s*${name}\\s*=\\s*(?:"([^"]*)"|([^;\\s]+))`, 'i').exec(header);
  return match ? (match[1] ?? match[2]) : undefined;
}

function decodeBody(body: string, encoding: string, charset: string | undefined): string {
  switch (encoding) {
    case 'base64':
      return decodeBytes(Buffer.from(body.replace(/\s+/g, ''), 'base64'), charset);
    case 'quoted-printable':
      return decodeBytes(quotedPrintableBytes(body.replace(/=\r?\n/g, '')), charset);
    default:
      return decodeBytes(Buffer.from(body, 'latin1'), charset);
  }
}

function walk(entity: string, mail: ParsedMail): void {
  const { headers, body } = splitHead(entity);
  const type = headers.get('content-type') ?? 'text/plain';
  const mediaType = type.split(';')[0].trim().toLowerCase();
  const boundary = param(type, 'boundary');
  if (mediaType.startsWith('multipart/') && boundary) {
    const sections = body.split(`--${boundary}`).slice(1);
    for (const section of sections) {
      if (section.startsWith('--')) break;
      walk(section.replace(/^\r?\n/, '').replace(/\r?\n$/, ''), mail);
    }
    return;
  }
  if (/^attachment/i.test(headers.get('content-disposition') ?? '')) return;
  const encoding = (headers.get('content-transfer-encoding') ?? '7bit').toLowerCase();
  if (mediaType === 'text/plain' && mail.text === null) mail.text = decodeBody(body, encoding, param(type, 'charset'));
  if (mediaType === 'text/html' && mail.html === null) mail.html = decodeBody(body, encoding, param(type, 'charset'));
}

export function parseMail(raw: Buffer): ParsedMail {
  const entity = raw.toString('latin1');
  const mail: ParsedMail = { headers: splitHead(entity).headers, text: null, html: null };
  walk(entity, mail);
  return mail;
}
