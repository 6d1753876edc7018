import { formatMoney } from '@shared/money';
import { REGISTRATION_STATUS_LABELS } from '@shared/schemas/class';
import type { Registration } from '../../models';

/** A cell as RFC 4180 quotes it; a leading = + - @ is defused so a spreadsheet never runs it as a formula (OWASP CSV Injection). */
export function csvCell(v: string): string {
  const safe = /^[=+\-@\t\r]/.test(v) ? `'${v}` : v;
  return /[",\r\n]/.test(safe) ? `"${safe.replace(/"/g, '""')}"` : safe;
}

/** The roster as CSV (CRLF line ends, RFC 4180), one row a registration in arrival order. */
export function rosterCsv(regs: readonly Registration[]): string {
  const head = ['Name', 'E-mail', 'Status', 'Paid', 'Registered at', 'Checked in'];
  const rows = regs.map((r) => [
    r.name,
    r.email,
    REGISTRATION_STATUS_LABELS[r.status],
    r.paidAt ? formatMoney(r.amountCents, r.currency) : '',
    r.createdAt.toISOString(),
    r.checkedInAt ? 'yes' : '',
  ]);
  return [head, ...rows].map((row) => row.map(csvCell).join(',')).join('\r\n') + '\r\n';
}
