import { describe, expect, it } from 'vitest';
import { moveVerb } from './move-words';

describe('moveVerb (what the history says of a move)', () => {
  it('names a first review’s moves as moves of the tutorial', () => {
    expect(moveVerb({ action: 'approve', from: 'in_review', to: 'approved', update: false })).toBe('approved it');
    expect(moveVerb({ action: 'publish', from: 'approved', to: 'published', update: false })).toBe('published it');
  });
  it('names an update’s moves as moves of the update', () => {
    expect(moveVerb({ action: 'submit', from: 'draft', to: 'in_review', update: true })).toBe('sent the update for review');
    expect(moveVerb({ action: 'sendBack', from: 'in_review', to: 'needs_changes', update: true })).toBe('sent the update back');
    expect(moveVerb({ action: 'publish', from: 'approved', to: 'published', update: true })).toBe('published the update');
  });
  it('says unpublishing as it is, and an unknown move by its states', () => {
    expect(moveVerb({ action: 'unpublish', from: 'published', to: 'draft', update: false })).toBe('unpublished it');
    expect(moveVerb({ action: 'archive', from: 'published', to: 'draft', update: false })).toMatch(/^moved it from .+ to .+$/);
  });
});
