import { describe, expect, it } from 'vitest';
import { paths, sameSiteNext } from './paths';

const ORIGIN = 'https://cardwright.example';

describe('sameSiteNext: where sign-in goes after ?next=', () => {
  it.each(['/tutorials/abc/write-up', '/studios/s1/board?column=review', '/outbox#latest'])('follows a path on this site: %s', (next) => {
    expect(sameSiteNext(next, ORIGIN)).toBe(next);
  });

  it('keeps what paths.signIn() sent along, once decoded as the browser hands it back', () => {
    const here = '/invite/tok-123?from=mail';
    const query = new URL(paths.signIn(here), ORIGIN).searchParams.get('next');
    expect(sameSiteNext(query, ORIGIN)).toBe(here);
  });

  // OWASP Unvalidated Redirects and Forwards Cheat Sheet: absolute, protocol-relative and backslash forms.
  it.each([
    'https://evil.example/steal',
    'http://cardwright.example.evil.example/',
    '//evil.example/steal',
    '/\\evil.example/steal',
    '/\t/evil.example',
    'javascript:alert(1)',
    'tutorials/abc',
    '',
    null,
  ])('goes home instead of %j', (next) => {
    expect(sameSiteNext(next, ORIGIN)).toBe('/');
  });
});
