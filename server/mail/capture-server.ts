import { mkdir, readdir, readFile, writeFile } from 'node:fs/promises';
import { join } from 'node:path';
import { randomUUID } from 'node:crypto';
import { SMTPServer } from 'smtp-server';
import { simpleParser } from 'mailparser';

/** A captured message as the Outbox page and tests read it. */
export interface CapturedMail {
  id: string;
  receivedAt: string;
  from: string;
  to: string[];
  subject: string;
  text: string;
  html: string | null;
}

/**
 * A real SMTP server on loopback that stores every message it receives as JSON in
 * `dir`, for local use and tests. Production points SMTP_URL elsewhere instead.
 */
export async function startCaptureServer(options: { dir: string; port?: number; host?: string }) {
  await mkdir(options.dir, { recursive: true });
  const server = new SMTPServer({
    authOptional: true,
    disabledCommands: ['STARTTLS'],
    logger: false,
    banner: 'Windway mail capture',
    onData(stream, session, callback) {
      simpleParser(stream)
        .then(async (parsed) => {
          const mail: CapturedMail = {
            id: `${Date.now()}-${randomUUID()}`,
            receivedAt: new Date().toISOString(),
            from: session.envelope.mailFrom ? session.envelope.mailFrom.address : '',
            to: session.envelope.rcptTo.map((r) => r.address),
            subject: parsed.subject ?? '',
            text: parsed.text ?? '',
            html: typeof parsed.html === 'string' ? parsed.html : null,
          };
          await writeFile(join(options.dir, `${mail.id}.json`), JSON.stringify(mail, null, 2));
          callback();
        })
        .catch((error: Error) => callback(error));
    },
  });
  const host = options.host ?? '127.0.0.1';
  await new Promise<void>((resolve, reject) => {
    server.once('error', reject);
    server.listen(options.port ?? 0, host, () => resolve());
  });
  const address = server.server.address();
  const port = typeof address === 'object' && address ? address.port : 0;
  return {
    port,
    url: `smtp://${host}:${port}`,
    close: () => new Promise<void>((resolve) => server.close(() => resolve())),
  };
}

/** Newest first. */
export async function readCapturedMail(dir: string): Promise<CapturedMail[]> {
  let names: string[];
  try {
    names = (await readdir(dir)).filter((n) => n.endsWith('.json'));
  } catch {
    return [];
  }
  const mails = await Promise.all(names.map(async (n) => JSON.parse(await readFile(join(dir, n), 'utf8')) as CapturedMail));
  return mails.sort((a, b) => b.id.localeCompare(a.id));
}
