import { describe, expect, it } from 'vitest';
import { dayIn, daysBetween, daysOfMonth, dueStatus, shiftMonth, weekdayIndex } from './dates';

describe('board dates', () => {
  it('counts days across month and leap-year ends', () => {
    expect(daysBetween('2027-01-31', '2027-02-01')).toBe(1);
    // 2028 is a leap year (Gregorian rule: divisible by 4, not by 100 unless by 400)
    expect(daysBetween('2028-02-28', '2028-03-01')).toBe(2);
    expect(daysBetween('2027-02-28', '2027-03-01')).toBe(1);
    expect(daysBetween('2027-03-10', '2027-03-01')).toBe(-9);
  });

  it('lists the days of a month (30, 31, 28 and 29-day months)', () => {
    expect(daysOfMonth('2027-04')).toHaveLength(30);
    expect(daysOfMonth('2027-01').at(-1)).toBe('2027-01-31');
    expect(daysOfMonth('2027-02')).toHaveLength(28);
    expect(daysOfMonth('2028-02')).toHaveLength(29);
  });

  it('shifts months across year ends', () => {
    expect(shiftMonth('2027-01', -1)).toBe('2026-12');
    expect(shiftMonth('2026-12', 1)).toBe('2027-01');
    expect(shiftMonth('2027-06', 12)).toBe('2028-06');
  });

  it('numbers weekdays from Monday (ISO 8601); 1 January 2027 is a Friday (from the calendar)', () => {
    expect(weekdayIndex('2027-01-01')).toBe(4);
    expect(weekdayIndex('2027-01-04')).toBe(0);
    expect(weekdayIndex('2027-01-03')).toBe(6);
  });

  it('places an instant on the day of the viewer’s time zone (IANA tz database offsets)', () => {
    // 23:30 UTC on 31 January is already 1 February in Berlin (UTC+1 in winter) and still 31 January in Chicago (UTC-6).
    expect(dayIn('2027-01-31T23:30:00Z', 'UTC')).toBe('2027-01-31');
    expect(dayIn('2027-01-31T23:30:00Z', 'Europe/Berlin')).toBe('2027-02-01');
    expect(dayIn('2027-02-01T03:00:00Z', 'America/Chicago')).toBe('2027-01-31');
  });

  it('says in words when a due date is past, today or this week; published work is never overdue', () => {
    expect(dueStatus('2027-01-18', '2027-01-20')).toEqual({ kind: 'overdue', days: 2, words: 'Overdue by 2 days' });
    expect(dueStatus('2027-01-19', '2027-01-20')?.words).toBe('Overdue by 1 day');
    expect(dueStatus('2027-01-20', '2027-01-20')?.words).toBe('Due today');
    expect(dueStatus('2027-01-21', '2027-01-20')?.words).toBe('Due this week: tomorrow');
    expect(dueStatus('2027-01-26', '2027-01-20')).toMatchObject({ kind: 'this_week', days: 6 });
    expect(dueStatus('2027-01-27', '2027-01-20')).toBeNull();
    expect(dueStatus('2027-01-18', '2027-01-20', true)).toBeNull();
    expect(dueStatus(null, '2027-01-20')).toBeNull();
  });
});
