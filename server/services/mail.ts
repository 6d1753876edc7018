import nodemailer, { type Transporter } from 'nodemailer';
import { config } from '../config';
import { palette } from '@shared/palette';
import { escapeHtml } from '../lib/html';

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

/** A plain message with one button-like link, in text and simple HTML. */
export function linkMail(opts: { to: string; subject: string; lines: string[]; link: string; linkLabel: string }): Mail {
  const text = [...opts.lines, '', `${opts.linkLabel}: ${opts.link}`, '', '— Cardwright'].join('\n');
  const html = `<div style="font-family:Georgia,serif;color:${palette.ink};max-width:520px">
${opts.lines.map((l) => `<p>${escapeHtml(l)}</p>`).join('\n')}
${mailButton(opts.link, opts.linkLabel)}</div>`;
  return { to: opts.to, subject: opts.subject, text, html };
}

/** A small print line in mail's HTML (a footer, a note). */
export const mailSmallPrint = (text: string) => `<p style="color:${palette.pencil};font-size:13px">${escapeHtml(text)}</p>`;

/** A button-like link in mail's HTML, with the address spelled out below for mail readers that hide links. */
export function mailButton(href: string, label: string): string {
  const style = `background:${palette.kraft};color:${palette.white};padding:8px 14px;border-radius:6px;text-decoration:none`;
  return `<p><a href="${escapeHtml(href)}" style="${style}">${escapeHtml(label)}</a></p>
${mailSmallPrint(`Or paste this address into your browser: ${href}`)}`;
}
