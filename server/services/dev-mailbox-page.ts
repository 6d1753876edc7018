import { palette as c } from '@shared/palette';
import type { OutboxMessage } from '../models';
import { escapeHtml as esc } from '../lib/html';

/**
 * The development mailbox's two pages (/dev/mail): every caught message, and one message with its
 * links made clickable. Plain HTML in the house palette; everything from a message is escaped.
 */

type Summary = Pick<OutboxMessage, 'id' | 'subject' | 'to' | 'createdAt'>;

const linkify = (text: string) =>
  text
    .split(/(https?:\/\/[^\s<>"]+)/g)
    .map((part, i) => (i % 2 ? `<a href="${esc(part)}">${esc(part)}</a>` : esc(part)))
    .join('');

function page(title: string, body: string): string {
  return `<!doctype html><html lang="en"><head><meta charset="utf-8"><meta name="viewport" content="width=device-width, initial-scale=1">
<meta name="robots" content="noindex"><title>${esc(title)} · Cardwright development mailbox</title>
<style>body{font-family:system-ui,sans-serif;background:${c.paper};color:${c.ink};max-width:56rem;margin:2rem auto;padding:0 1rem;line-height:1.5}
a{color:${c.kraftDark}}ul{list-style:none;padding:0;border:1px solid ${c.line};background:${c.white};border-radius:8px}li{border-bottom:1px solid ${c.line}}
li:last-child{border:0}li a{display:block;padding:.5rem 1rem;text-decoration:none}small{color:${c.pencil}}pre{white-space:pre-wrap;background:${c.white};border:1px solid ${c.line};border-radius:8px;padding:1rem;font:inherit}
.note{border-left:4px dashed ${c.kraft};padding-left:.75rem}</style></head><body><main>${body}</main></body></html>`;
}

/** Every caught message, newest first, for every address. */
export function mailListPage(list: Summary[]): string {
  const items = list.length
    ? `<ul>${list
        .map(
          (m) =>
            `<li><a href="/dev/mail/${m.id}"><strong>${esc(m.subject || '(no subject)')}</strong><br><small>to ${esc(m.to)} · ${esc(m.createdAt.toISOString())}</small></a></li>`,
        )
        .join('')}</ul>`
    : '<p>No mail yet. Invitations, password resets and review notices appear here.</p>';
  return page(
    'All mail',
    `<h1>Development mailbox</h1><p class="note">Every message the local stand-in for a mail server caught, for every address. Only this computer can open this page, and only while no real mail server is set; it never exists in production.</p>${items}`,
  );
}

/** One message: its head, its text with the links clickable, and the names of its attachments. */
export function mailMessagePage(m: OutboxMessage): string {
  const attachments = m.attachments.length
    ? `<p><small>Attachments: ${m.attachments.map((a) => esc(`${a.filename} (${Math.round(a.size / 1024)} KB)`)).join(', ')}</small></p>`
    : '';
  return page(
    m.subject,
    `<p><a href="/dev/mail">← All mail</a></p><h1>${esc(m.subject || '(no subject)')}</h1><p><small>From ${esc(m.from)} to ${esc(m.to)} · ${esc(m.createdAt.toISOString())}</small></p><pre>${linkify(m.text)}</pre>${attachments}`,
  );
}
