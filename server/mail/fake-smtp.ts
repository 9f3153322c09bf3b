/**
 * The local fake SMTP server (development and tests): listens on 127.0.0.1 on a random port,
 * accepts any sender without authentication, keeps each message it receives in memory
 * (recipients, subject, text) and stamps captured_at on the matching outbox row.
 */
import type { AddressInfo } from 'node:net';
import type { Knex } from 'knex';
import { SMTPServer } from 'smtp-server';
import { markCaptured } from './outbox.repository';
import { OUTBOX_HEADER } from './mail-worker';

export interface CapturedMail {
  from: string;
  to: string[];
  subject: string;
  text: string;
  outboxId: number | null;
  raw: string;
}

export interface FakeSmtp {
  url: string;
  port: number;
  received: CapturedMail[];
  close(): Promise<void>;
}

/** Unfolds headers and reads the ones we need; decodes a quoted-printable text part. */
export function parseMessage(raw: string): { headers: Map<string, string>; text: string } {
  const split = raw.indexOf('\r\n\r\n');
  const head = split >= 0 ? raw.slice(0, split) : raw;
  const body = split >= 0 ? raw.slice(split + 4) : '';
  const headers = new Map<string, string>();
  for (const line of head.replace(/\r\n[ \t]+/g, ' ').split('\r\n')) {
    const colon = line.indexOf(':');
    if (colon > 0) headers.set(line.slice(0, colon).trim().toLowerCase(), line.slice(colon + 1).trim());
  }
  return { headers, text: extractText(headers, body) };
}

function extractText(headers: Map<string, string>, body: string): string {
  const type = headers.get('content-type') ?? 'text/plain';
  const boundary = /boundary="?([^";]+)"?/i.exec(type)?.[1];
  if (boundary) {
    for (const part of body.split(`--${boundary}`)) {
      const inner = parseMessage(part.replace(/^\r\n/, ''));
      const innerType = inner.headers.get('content-type') ?? '';
      if (innerType.startsWith('text/plain') || innerType.startsWith('multipart/')) return inner.text;
    }
    return '';
  }
  const encoding = (headers.get('content-transfer-encoding') ?? '').toLowerCase();
  if (encoding === 'quoted-printable') {
    const bytes = body
      .replace(/=\r\n/g, '')
      .replace(/=([0-9A-F]{2})/gi, (_m, hex: string) => String.fromCharCode(parseInt(hex, 16)));
    return Buffer.from(bytes, 'latin1').toString('utf8').trim();
  }
  if (encoding === 'base64') return Buffer.from(body.replace(/\s+/g, ''), 'base64').toString('utf8').trim();
  return body.trim();
}

/** Starts the fake on 127.0.0.1; port 0 (the default) picks a free one. */
export async function startFakeSmtp(db: Knex | null, port = 0): Promise<FakeSmtp> {
  const received: CapturedMail[] = [];
  const server = new SMTPServer({
    authOptional: true,
    disabledCommands: ['STARTTLS'],
    logger: false,
    // Pooled clients keep idle connections open: close() ends them after this long, not after 30 s.
    closeTimeout: 250,
    onData(stream, session, callback) {
      const chunks: Buffer[] = [];
      stream.on('data', (chunk: Buffer) => chunks.push(chunk));
      stream.on('end', () => {
        const raw = Buffer.concat(chunks).toString('utf8');
        const { headers, text } = parseMessage(raw);
        const outboxId = Number(headers.get(OUTBOX_HEADER.toLowerCase()));
        const mail: CapturedMail = {
          from: session.envelope.mailFrom ? session.envelope.mailFrom.address : '',
          to: session.envelope.rcptTo.map((r) => r.address),
          subject: headers.get('subject') ?? '',
          text,
          outboxId: Number.isInteger(outboxId) && outboxId > 0 ? outboxId : null,
          raw,
        };
        received.push(mail);
        const mark = db && mail.outboxId ? markCaptured(db, mail.outboxId) : Promise.resolve();
        mark.then(
          () => callback(),
          (err: Error) => callback(err),
        );
      });
    },
  });
  await new Promise<void>((resolve, reject) => {
    server.once('error', reject);
    server.listen(port, '127.0.0.1', () => resolve());
  });
  server.on('error', (err) => console.warn('fake SMTP server error:', err));
  const bound = (server.server.address() as AddressInfo).port;
  return {
    url: `smtp://127.0.0.1:${bound}`,
    port: bound,
    received,
    close: () => new Promise<void>((resolve) => server.close(() => resolve())),
  };
}
