import nodemailer, { type Transporter } from 'nodemailer';
import { getConfig } from '../config';
import type { MailMessage } from './templates';

let transporter: Transporter | undefined;

/**
 * Real SMTP through nodemailer. Locally and in tests SMTP_URL points at the capture
 * server on loopback (plain SMTP, no TLS); in production at a real provider.
 */
function getTransporter(): Transporter | undefined {
  const { SMTP_URL } = getConfig();
  if (!SMTP_URL) return undefined;
  // Loopback capture needs no TLS; a real provider's URL (smtps:// or ?requireTLS) decides its own.
  const url = new URL(SMTP_URL);
  transporter ??= nodemailer.createTransport({
    host: url.hostname,
    port: Number(url.port) || 587,
    secure: url.protocol === 'smtps:',
    ignoreTLS: url.hostname === '127.0.0.1',
    auth: url.username ? { user: decodeURIComponent(url.username), pass: decodeURIComponent(url.password) } : undefined,
  });
  return transporter;
}

export interface SentMail {
  messageId: string | null;
  delivered: boolean;
}

/** Sends one message; a mail failure is logged, never turned into a failed user action. */
export async function sendMail(to: string | string[], message: MailMessage): Promise<SentMail> {
  const transport = getTransporter();
  if (!transport) {
    console.warn(`[mail] SMTP_URL is not set; not sending "${message.subject}" to ${String(to)}`);
    return { messageId: null, delivered: false };
  }
  try {
    const info = await transport.sendMail({ from: getConfig().MAIL_FROM, to, ...message });
    return { messageId: info.messageId ?? null, delivered: true };
  } catch (error) {
    console.error(`[mail] could not send "${message.subject}":`, error);
    return { messageId: null, delivered: false };
  }
}

export function resetMailer(): void {
  transporter?.close();
  transporter = undefined;
}
