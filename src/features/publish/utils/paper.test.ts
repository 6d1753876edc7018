import { describe, expect, it } from 'vitest';
import { asPaper, defaultPaper } from './paper';

// Which regions print on Letter is from memory (US, Canada, Mexico, the Philippines and others in
// the Americas); ISO 216 A4 elsewhere.
describe('defaultPaper', () => {
  it('gives Letter for the United States and Canada (from memory)', () => {
    expect(defaultPaper('en-US')).toBe('letter');
    expect(defaultPaper('fr-CA')).toBe('letter');
    expect(defaultPaper('es-MX')).toBe('letter');
  });
  it('gives A4 where ISO 216 paper is the norm (from memory)', () => {
    expect(defaultPaper('en-GB')).toBe('a4');
    expect(defaultPaper('de-DE')).toBe('a4');
    expect(defaultPaper('en-AU')).toBe('a4');
    expect(defaultPaper('ja-JP')).toBe('a4');
  });
  it('fills in the likely region of a bare language (Unicode CLDR likely subtags)', () => {
    // CLDR likely subtags: de -> de-Latn-DE, en -> en-Latn-US.
    expect(defaultPaper('de')).toBe('a4');
    expect(defaultPaper('en')).toBe('letter');
  });
  it('falls back to Letter for no locale or a malformed one', () => {
    expect(defaultPaper(undefined)).toBe('letter');
    expect(defaultPaper('not a locale!')).toBe('letter');
  });
});

describe('asPaper', () => {
  it('accepts only the two papers the exports take', () => {
    expect(asPaper('a4')).toBe('a4');
    expect(asPaper('letter')).toBe('letter');
    expect(asPaper('A4')).toBeNull();
    expect(asPaper(null)).toBeNull();
  });
});
