import 'server-only';
import nodemailer, { type Transporter } from 'nodemailer';
import { env } from '../env';

const globalForMail = globalThis as unknown as { stepwellMail?: { url: string; transport: Transporter } };

// SMTP_URL points at the local fake in development and tests, and at a real provider in production.
export function mailTransport(): Transporter {
  const url = env().SMTP_URL;
  if (globalForMail.stepwellMail?.url !== url) {
    globalForMail.stepwellMail = { url, transport: nodemailer.createTransport(url) };
  }
  return globalForMail.stepwellMail.transport;
}

export async function sendMail(message: { to: string; subject: string; text: string; html: string }): Promise<void> {
  await mailTransport().sendMail({ from: env().MAIL_FROM, ...message });
}
