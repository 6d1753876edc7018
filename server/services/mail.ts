import nodemailer, { type Transporter } from 'nodemailer';
import { config } from '../config';

let transport: Transporter | null = null;

function getTransport(): Transporter {
  transport ??= nodemailer.createTransport({
    host: config.mail.host,
    port: config.mail.port,
    secure: false,
    // The local fake speaks plain SMTP on loopback; a real host negotiates TLS as usual.
    ignoreTLS: config.mail.fake,
    tls: config.mail.fake ? undefined : { rejectUnauthorized: true },
  });
  return transport;
}

export type Mail = {
  to: string;
  subject: string;
  text: string;
  html?: string;
  attachments?: { filename: string; content: Buffer; contentType?: string }[];
};

/** Sends one message through SMTP (the local fake in development and tests). */
export async function sendMail(mail: Mail): Promise<void> {
  await getTransport().sendMail({ from: config.mail.from, ...mail });
}

const escape = (s: string) => s.replace(/[&<>"']/g, (c) => `&#${c.charCodeAt(0)};`);

/** A plain message with one button-like link, in text and simple HTML. */
export function linkMail(opts: { to: string; subject: string; lines: string[]; link: string; linkLabel: string }): Mail {
  const text = [...opts.lines, '', `${opts.linkLabel}: ${opts.link}`, '', '— Cardwright'].join('\n');
  const html = `<div style="font-family:Georgia,serif;color:#22303C;max-width:520px">
${opts.lines.map((l) => `<p>${escape(l)}</p>`).join('\n')}
<p><a href="${escape(opts.link)}" style="background:#A87B4F;color:#fff;padding:8px 14px;border-radius:6px;text-decoration:none">${escape(opts.linkLabel)}</a></p>
<p style="color:#8A8F98;font-size:13px">Or paste this address into your browser: ${escape(opts.link)}</p></div>`;
  return { to: opts.to, subject: opts.subject, text, html };
}
