import { describe, expect, it } from 'vitest';
import { dispositionFilename } from './content-disposition';

describe('dispositionFilename', () => {
  // RFC 6266 section 5 examples.
  it('reads a bare token name (RFC 6266 §5, first example)', () => {
    expect(dispositionFilename('Attachment; filename=example.html')).toBe('example.html');
  });
  it('prefers filename* over filename (RFC 6266 §5, last example)', () => {
    expect(dispositionFilename(`attachment; filename="EURO rates"; filename*=utf-8''%e2%82%ac%20rates`)).toBe('€ rates');
  });
  it('decodes the RFC 8187 extended form (RFC 6266 §5, "€ rates" example)', () => {
    expect(dispositionFilename(`attachment; filename*= UTF-8''%e2%82%ac%20rates`)).toBe('€ rates');
  });
  it('undoes quoted-pair escapes (RFC 7230 §3.2.6 quoted-string)', () => {
    expect(dispositionFilename('attachment; filename="say \\"hi\\".txt"')).toBe('say "hi".txt');
  });
  it('drops path parts (RFC 6266 §4.3)', () => {
    expect(dispositionFilename('attachment; filename="../../etc/passwd"')).toBe('passwd');
    expect(dispositionFilename('attachment; filename="C:\\\\temp\\\\box.zip"')).toBe('box.zip');
  });
  it('reads what Express res.attachment() writes for an ASCII name', () => {
    // Express (via the content-disposition package) quotes the plain name.
    expect(dispositionFilename('attachment; filename="round-keepsake-box-template-a4.pdf"')).toBe('round-keepsake-box-template-a4.pdf');
  });
  it('gives null when there is no name', () => {
    expect(dispositionFilename('inline')).toBeNull();
    expect(dispositionFilename(null)).toBeNull();
    expect(dispositionFilename('attachment; filename=""')).toBeNull();
  });
  it('keeps the plain name when the extended one is malformed', () => {
    expect(dispositionFilename(`attachment; filename="box.zip"; filename*=UTF-8''%E0%A4%A`)).toBe('box.zip');
  });
});
