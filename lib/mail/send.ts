// Sends plain-text mail through SMTP (SMTP_HOST, SMTP_PORT; the local fake under npm start
// and npm test). Without SMTP_HOST the message is written to the server log instead.
import nodemailer, { type Transporter } from 'nodemailer';

export interface MailMessage { to: string; subject: string; text: string }

const FROM = process.env.MAIL_FROM ?? 'Antinode <no-reply@antinode.test>';
let transporter: Transporter | null = null;

function transport(): Transporter {
  if (transporter) return transporter;
  const host = process.env.SMTP_HOST;
  transporter = host
    ? nodemailer.createTransport({ host, port: Number(process.env.SMTP_PORT ?? 25), secure: false, ignoreTLS: true })
    : nodemailer.createTransport({ jsonTransport: true });
  return transporter;
}

export async function sendMail(message: MailMessage): Promise<void> {
  const info = await transport().sendMail({ from: FROM, ...message });
  if (!process.env.SMTP_HOST) console.info('[mail] SMTP_HOST is not set; message not sent:', info.message);
}
