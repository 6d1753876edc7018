import { describe, expect, it } from 'vitest';
import { classWhen, offsetMinutes, zonedIso } from './when';
import { divideRounded, formatMoney, minorDigits, parseMoney } from '../money';

describe('class times', () => {
  // US Central: CST is UTC-6, CDT is UTC-5; in 2027 DST starts March 14 at 2:00 (second Sunday in March, US Energy Policy Act of 2005).
  it('writes a wall-clock time in its zone with the offset of that date', () => {
    expect(zonedIso('2027-01-10', '18:30', 'America/Chicago')).toBe('2027-01-10T18:30:00-06:00');
    expect(zonedIso('2027-03-20', '18:30', 'America/Chicago')).toBe('2027-03-20T18:30:00-05:00');
    expect(zonedIso('2027-07-01', '10:00', 'Europe/London')).toBe('2027-07-01T10:00:00+01:00');
    expect(zonedIso('2027-07-01', '10:00', 'Asia/Kolkata')).toBe('2027-07-01T10:00:00+05:30');
    expect(zonedIso('2027-7-1', '10:00', 'UTC')).toBeNull();
    expect(offsetMinutes(new Date('2027-01-10T12:00:00Z'), 'America/Chicago')).toBe(-360);
  });
  it('says when in the class’s own zone', () => {
    expect(classWhen('2027-03-20T23:30:00Z', 90, 'America/Chicago')).toMatch(/^Saturday, March 20, 2027, 6:30\s?–\s?8:00\sPM CDT$/);
  });
});

describe('money in minor units', () => {
  // ISO 4217: USD and EUR have 2 decimal places, JPY none.
  it('knows each currency’s minor unit and reads and shows amounts exactly', () => {
    expect(minorDigits('USD')).toBe(2);
    expect(minorDigits('JPY')).toBe(0);
    expect(parseMoney('15', 'USD')).toBe(1500);
    expect(parseMoney('15.5', 'USD')).toBe(1550);
    expect(parseMoney('0.07', 'USD')).toBe(7);
    expect(parseMoney('15.555', 'USD')).toBeNull();
    expect(parseMoney('1,500', 'JPY')).toBe(1500);
    expect(formatMoney(1500, 'USD')).toBe('$15.00');
    expect(formatMoney(1500, 'JPY')).toBe('¥1,500');
  });
  it('shares a total by whole units, rounding half up', () => {
    expect(divideRounded(615, 9)).toBe(68); // 68.33
    expect(divideRounded(617, 9)).toBe(69); // 68.56
    expect(divideRounded(9, 2)).toBe(5); // 4.5 rounds up
  });
});
