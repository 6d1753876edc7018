import { describe, expect, it } from 'vitest';
import { insertMention, matchPeople, mentionQuery, mentionsStillIn, splitMentions } from './mentions';

const people = [
  { id: '1', name: 'Ann Lee' },
  { id: '2', name: 'Bea Annis' },
  { id: '3', name: 'Cy Moss' },
];

describe('mentions in a comment', () => {
  it('finds the query after an "@" at the caret, not in an e-mail address or across lines', () => {
    expect(mentionQuery('Thanks @An', 10)).toEqual({ start: 7, query: 'An' });
    expect(mentionQuery('@', 1)).toEqual({ start: 0, query: '' });
    expect(mentionQuery('write to ann@shop.example', 25)).toBeNull();
    expect(mentionQuery('@Ann\nmore', 9)).toBeNull();
    expect(mentionQuery('no mention', 10)).toBeNull();
  });

  it('matches names that start with the query first, then any word of a name', () => {
    expect(matchPeople(people, 'an').map((p) => p.id)).toEqual(['1', '2']);
    expect(matchPeople(people, 'mo').map((p) => p.id)).toEqual(['3']);
    expect(matchPeople(people, '').map((p) => p.id)).toEqual(['1', '2', '3']);
  });

  it('inserts the name and moves the caret after it', () => {
    expect(insertMention('Thanks @An!', 7, 10, 'Ann Lee')).toEqual({ text: 'Thanks @Ann Lee !', caret: 16 });
  });

  it('keeps only the picked people still named in the text', () => {
    expect(mentionsStillIn('@Ann Lee see this', people)).toEqual(['1']);
  });

  it('splits out the mentions, longest names first', () => {
    expect(splitMentions('@Ann Lee and @Annabel', ['Ann', 'Ann Lee'])).toEqual([
      { text: '@Ann Lee', mention: true },
      { text: ' and @Annabel', mention: false },
    ]);
  });
});
