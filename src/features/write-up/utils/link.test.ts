import { describe, expect, it } from 'vitest';
import { linkFromInput } from './link';

describe('linkFromInput', () => {
  it('adds https:// to a bare host and mailto: to an e-mail address (RFC 6068)', () => {
    expect(linkFromInput('shop.example/kraft-cardstock')).toBe('https://shop.example/kraft-cardstock');
    expect(linkFromInput('  https://shop.example/a?b=1  ')).toBe('https://shop.example/a?b=1');
    expect(linkFromInput('orders@shop.example')).toBe('mailto:orders@shop.example');
  });
  it('keeps links within the site as they are', () => {
    expect(linkFromInput('/tutorials/round-box')).toBe('/tutorials/round-box');
    expect(linkFromInput('#step-3')).toBe('#step-3');
  });
  it('refuses script and data addresses instead of guessing (WHATWG URL schemes)', () => {
    expect(linkFromInput('javascript:alert(1)')).toBeNull();
    expect(linkFromInput('data:text/html,<b>x</b>')).toBeNull();
    expect(linkFromInput('')).toBeNull();
  });
});
