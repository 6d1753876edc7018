import { describe, expect, it } from 'vitest';
import { isSafeImageSrc, isSafeLinkHref, isSafeVideoUrl } from './urls';

describe('isSafeLinkHref', () => {
  it.each([
    'https://shop.example/kraft-cardstock',
    'http://shop.example/',
    'mailto:team@studio.example',
    '/tutorials/hexagon-box',
    '#step-3',
    'gatefold-card.html',
    '?page=2',
  ])('keeps %s (http(s), mailto and relative references)', (href) => expect(isSafeLinkHref(href)).toBe(true));

  // OWASP XSS Filter Evasion Cheat Sheet: script URLs in every disguise that reaches a URL as text.
  it.each([
    'javascript:alert(1)',
    'JaVaScRiPt:alert(1)', // case
    'jav\tascript:alert(1)', // embedded tab (browsers drop it: WHATWG URL Standard)
    'jav\nascript:alert(1)', // embedded line feed
    'jav\rascript:alert(1)', // embedded carriage return
    ' javascript:alert(1)', // leading space
    '\u0001javascript:alert(1)', // leading control character
    'vbscript:msgbox(1)',
    'data:text/html;base64,PHNjcmlwdD5hbGVydCgxKTwvc2NyaXB0Pg==',
    'file:///etc/passwd',
    'livescript:alert(1)',
    '//evil.example/steal', // protocol-relative: another site without naming a scheme
    '/\\evil.example/steal', // browsers read a backslash as a slash in http(s) addresses (WHATWG URL Standard)
    '\\\\evil.example/steal',
  ])('refuses %j', (href) => expect(isSafeLinkHref(href)).toBe(false));

  it('refuses non-strings and over-long addresses', () => {
    expect(isSafeLinkHref(undefined)).toBe(false);
    expect(isSafeLinkHref(42)).toBe(false);
    expect(isSafeLinkHref(`https://shop.example/${'a'.repeat(3000)}`)).toBe(false);
  });

  it('an entity-encoded scheme stays harmless text once escaped ("javascript&colon;" is a relative path)', () => {
    // HTML entities mean nothing in JSON; the renderer escapes "&" so the browser sees the same text.
    expect(isSafeLinkHref('javascript&colon;alert(1)')).toBe(true);
    expect(new URL('javascript&colon;alert(1)', 'https://relative.invalid/').protocol).toBe('https:');
  });
});

describe('isSafeImageSrc', () => {
  it.each(['/media/stills/4b1c.jpg', '/media/stills/4b1c.jpg?w=600', 'https://cdn.example/box.jpg', 'http://cdn.example/box.png'])('keeps %s', (src) =>
    expect(isSafeImageSrc(src)).toBe(true),
  );

  it.each([
    'javascript:alert(1)',
    'data:image/svg+xml;base64,PHN2ZyBvbmxvYWQ9YWxlcnQoMSk+',
    '//cdn.example/box.jpg', // protocol-relative
    'box.jpg', // relative outside our media
    '/media/../secrets.txt', // dot segments
    '/media/%2e%2e/secrets.txt',
    '/media\\..\\secrets.txt',
    '/mediafile.jpg',
    'https://',
    '',
  ])('refuses %j', (src) => expect(isSafeImageSrc(src)).toBe(false));
});

describe('isSafeVideoUrl', () => {
  it('takes web and relative addresses but not mail', () => {
    expect(isSafeVideoUrl('https://video.example/watch/hex')).toBe(true);
    expect(isSafeVideoUrl('/t/hexagon-box')).toBe(true);
    expect(isSafeVideoUrl('mailto:a@b.example')).toBe(false);
    expect(isSafeVideoUrl('javascript:alert(1)')).toBe(false);
  });
});
