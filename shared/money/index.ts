/**
 * Money as integer minor units with an ISO 4217 currency (cents for USD, yen for JPY). Amounts are
 * never floats: sums and shares are integer arithmetic, and only display divides.
 */

/** Digits after the decimal point of a currency's minor unit (2 for USD and EUR, 0 for JPY), per ICU's ISO 4217 data. */
export function minorDigits(currency: string): number {
  return new Intl.NumberFormat('en', { style: 'currency', currency }).resolvedOptions().maximumFractionDigits ?? 2;
}

/** Is this an ISO 4217 code the runtime knows ("USD", "EUR", "GBP" ...)? */
export function isCurrency(code: string): boolean {
  return /^[A-Z]{3}$/.test(code) && Intl.supportedValuesOf('currency').includes(code);
}

/** "$15.00", "€12.50", "¥1,500": minor units shown in the currency's own way. */
export function formatMoney(minor: number, currency: string, locale = 'en-US'): string {
  const d = minorDigits(currency);
  return new Intl.NumberFormat(locale, { style: 'currency', currency, minimumFractionDigits: d, maximumFractionDigits: d }).format(minor / 10 ** d);
}

/** Reads "15", "15.5", "15.50" or "1,500" as minor units of the currency; null when it is not an amount. */
export function parseMoney(text: string, currency: string): number | null {
  const t = text.trim().replace(/[\s,]/g, '');
  const d = minorDigits(currency);
  const m = /^(\d{1,9})(?:\.(\d*))?$/.exec(t);
  if (!m) return null;
  const frac = m[2] ?? '';
  if (frac.length > d) return null;
  return Number(m[1]) * 10 ** d + Number(frac.padEnd(d, '0') || '0');
}

/** Minor units to the text a form field shows ("15.00"). */
export function moneyInputText(minor: number, currency: string): string {
  const d = minorDigits(currency);
  if (d === 0) return String(minor);
  const s = String(minor).padStart(d + 1, '0');
  return `${s.slice(0, -d)}.${s.slice(-d)}`;
}

/** a / b rounded half up, in integers (shares of a total, never floats). */
export function divideRounded(a: number, b: number): number {
  if (b <= 0) throw new RangeError('divide by a positive count');
  const q = Math.floor(a / b);
  return a - q * b >= b - (a - q * b) ? q + 1 : q;
}
