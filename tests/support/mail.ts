import { readCapturedMail, type CapturedMail } from '@server/mail/capture-server';

/** Waits for a captured message to `to` whose subject matches, as delivered over real SMTP. */
export async function waitForMail(to: string, subject: RegExp, timeoutMs = 5000): Promise<CapturedMail> {
  const dir = process.env.MAIL_CAPTURE_DIR;
  if (!dir) throw new Error('MAIL_CAPTURE_DIR is unset: run through `npm test`.');
  const deadline = Date.now() + timeoutMs;
  for (;;) {
    const found = (await readCapturedMail(dir)).find((m) => m.to.includes(to) && subject.test(m.subject));
    if (found) return found;
    if (Date.now() > deadline) throw new Error(`No mail to ${to} matching ${subject} within ${timeoutMs} ms`);
    await new Promise((r) => setTimeout(r, 50));
  }
}
