/**
 * A local SMTP server standing in for the shop's mail provider in development and tests. Every
 * mail it accepts is kept in its folder as <received>-<random>.eml, listed in index.json, so a
 * developer (through the admin's dev routes) or a test can read what would have been sent.
 */
import { randomBytes } from 'node:crypto';
import fs from 'node:fs';
import path from 'node:path';
import { SMTPServer } from 'smtp-server';
import { SmtpSettings } from '../env';
import { decodeWords, parseMail } from './mime';

export interface OutboxEntry {
  id: string;
  from: string;
  /** Envelope recipients, which include any Bcc. */
  to: string[];
  subject: string;
  /** ISO 8601, when the stand-in received it. */
  date: string;
}

export interface OutboxMail extends OutboxEntry {
  text: string | null;
  html: string | null;
}

const MAX_MAIL_BYTES = 10 * 1024 * 1024;

export class SmtpOutbox {
  private constructor(
    readonly dir: string,
    private readonly server: SMTPServer,
    readonly port: number,
  ) {}

  /** Listens on 127.0.0.1 on a free port. */
  static async start(dir: string, log: (message: string, detail?: unknown) => void): Promise<SmtpOutbox> {
    fs.mkdirSync(dir, { recursive: true });
    const server = new SMTPServer({
      authOptional: true,
      disabledCommands: ['AUTH', 'STARTTLS'],
      size: MAX_MAIL_BYTES,
      logger: false,
      onData(stream, session, callback) {
        const chunks: Buffer[] = [];
        stream.on('data', (chunk: Buffer) => chunks.push(chunk));
        stream.on('end', () => {
          if (stream.sizeExceeded) return callback(Object.assign(new Error('Mail too large'), { responseCode: 552 }));
          try {
            store(dir, Buffer.concat(chunks), session.envelope.rcptTo.map((address) => address.address));
            callback();
          } catch (err) {
            log('outbox: could not keep a mail', err);
            callback(err as Error);
          }
        });
      },
    });
    const port = await new Promise<number>((resolve, reject) => {
      server.once('error', reject);
      server.listen(0, '127.0.0.1', () => {
        const address = server.server.address();
        resolve(typeof address === 'object' && address ? address.port : 0);
      });
    });
    server.on('error', (err) => log('outbox: SMTP error', err));
    return new SmtpOutbox(dir, server, port);
  }

  /** How the mailer reaches this stand-in. */
  get smtp(): SmtpSettings {
    return { host: '127.0.0.1', port: this.port, secure: false };
  }

  /** Newest first. */
  list(): OutboxEntry[] {
    return readIndex(this.dir).slice().reverse();
  }

  read(id: string): OutboxMail | undefined {
    // Looked up in the index, never joined into a path as given.
    const entry = readIndex(this.dir).find((e) => e.id === id);
    if (!entry) return undefined;
    const { text, html } = parseMail(fs.readFileSync(path.join(this.dir, `${entry.id}.eml`)));
    return { ...entry, text, html };
  }

  close(): Promise<void> {
    return new Promise((resolve) => this.server.close(() => resolve()));
  }
}

function indexFile(dir: string): string {
  return path.join(dir, 'index.json');
}

function readIndex(dir: string): OutboxEntry[] {
  const file = indexFile(dir);
  return fs.existsSync(file) ? (JSON.parse(fs.readFileSync(file, 'utf8')) as OutboxEntry[]) : [];
}

function store(dir: string, raw: Buffer, to: string[]): void {
  const received = new Date();
  const id = `${received.toISOString().replace(/[:.]/g, '-')}-${randomBytes(4).toString('hex')}`;
  fs.writeFileSync(path.join(dir, `${id}.eml`), raw);
  const { headers } = parseMail(raw);
  const entry: OutboxEntry = {
    id,
    from: decodeWords(headers.get('from') ?? ''),
    to,
    subject: decodeWords(headers.get('subject') ?? ''),
    date: received.toISOString(),
  };
  // Written aside and renamed, so a reader never sees half an index.
  const next = path.join(dir, `index.json.${id}`);
  fs.writeFileSync(next, JSON.stringify([...readIndex(dir), entry], null, 2));
  fs.renameSync(next, indexFile(dir));
}
