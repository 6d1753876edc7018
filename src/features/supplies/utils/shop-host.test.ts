import { describe, expect, it } from 'vitest';
import { shopHost } from './shop-host';

describe('shopHost', () => {
  it('shows the host without "www.", the port or the path (host parsing as in the WHATWG URL Standard)', () => {
    expect(shopHost('https://www.Paper-Shop.example:8443/kraft?ref=box#top')).toBe('paper-shop.example');
    expect(shopHost('http://shop.example/glue')).toBe('shop.example');
  });
  it('shows an international domain in its ASCII form (WHATWG URL "domain to ASCII"; RFC 3492 Punycode)', () => {
    // A look-alike host is shown as what it really is. "bücher" -> "xn--bcher-kva" is the usual IDNA example (from memory).
    expect(shopHost('https://bücher.example/papier')).toBe('xn--bcher-kva.example');
  });
  it('gives nothing for a missing link or one that is not a web address', () => {
    expect(shopHost(null)).toBeNull();
    expect(shopHost('')).toBeNull();
    expect(shopHost('shop.example/glue')).toBeNull();
    expect(shopHost('javascript:alert(1)')).toBeNull();
  });
});
