import { describe, expect, it } from 'vitest';
import { endSentence } from './sentence';

describe('endSentence', () => {
  // One full stop ends a sentence whose last word is an abbreviation (The Chicago Manual of Style, 6.122: from memory).
  it('adds a full stop, but not after a name that ends with one', () => {
    expect(endSentence('Moved in Kraft House')).toBe('Moved in Kraft House.');
    expect(endSentence('Moved in Paper & Co.')).toBe('Moved in Paper & Co.');
    expect(endSentence('A tutorial by Ann Lee Jr. ')).toBe('A tutorial by Ann Lee Jr.');
    expect(endSentence('Registered with “Cut It Out!”')).toBe('Registered with “Cut It Out!”');
    expect(endSentence('Did it fold?')).toBe('Did it fold?');
  });
});
