import { describe, expect, it } from 'vitest';
import { createSupplySchema } from '@shared/schemas/supply';
import { guessCategory, parseSupplyLine, parseSupplyLines, readLeadingQuantity } from './parse-supply-lines';

// Every example is an invented supply list for a round keepsake box, a gatefold birthday card or
// a hexagon treat box. Which word puts a supply in which category is trade vocabulary (common
// practice among card makers), not a published standard.

describe('parseSupplyLine', () => {
  it('takes a leading count with its unit as the quantity', () => {
    expect(parseSupplyLine('2 sheets kraft cardstock').supply).toEqual({
      category: 'cardstock',
      name: 'Kraft cardstock',
      quantity: '2 sheets',
      note: '',
      url: null,
      discountCode: null,
    });
    expect(parseSupplyLine('3 sheets of vellum').supply).toMatchObject({ quantity: '3 sheets', name: 'Vellum', category: 'paper' });
    expect(parseSupplyLine('4 bulldog clips').supply).toMatchObject({ quantity: '4', name: 'Bulldog clips', category: 'tool' });
    expect(parseSupplyLine('2pcs chipboard circles').supply).toMatchObject({ quantity: '2 pcs', name: 'Chipboard circles', category: 'cardstock' });
    expect(parseSupplyLine('3 x satin ribbon bows').supply).toMatchObject({ quantity: '3', name: 'Satin ribbon bows', category: 'embellishment' });
  });

  it('reads number words and amount words', () => {
    expect(parseSupplyLine('two sheets patterned paper').supply).toMatchObject({ quantity: '2 sheets', name: 'Patterned paper' });
    expect(parseSupplyLine('a sheet of vellum').supply).toMatchObject({ quantity: '1 sheet', name: 'Vellum' });
    expect(parseSupplyLine('half a sheet of gold mirror cardstock').supply).toMatchObject({ quantity: '1/2 sheet', name: 'Gold mirror cardstock' });
    expect(parseSupplyLine('a few clear gems').supply).toMatchObject({ quantity: 'a few', name: 'Clear gems', category: 'embellishment' });
    expect(parseSupplyLine('a pair of detail scissors').supply).toMatchObject({ quantity: '1 pair', name: 'Detail scissors', category: 'tool' });
    expect(parseSupplyLine('a dozen enamel dots').supply).toMatchObject({ quantity: '12', name: 'Enamel dots', category: 'embellishment' });
    // "a" alone is an article, not an amount.
    expect(parseSupplyLine('a bone folder').supply).toMatchObject({ quantity: '', name: 'Bone folder', category: 'tool' });
  });

  it('writes unicode fractions the way crafters type them (U+00BD ONE HALF, U+00BC ONE QUARTER: Unicode Number Forms)', () => {
    expect(parseSupplyLine('1½ yards seam binding ribbon').supply).toMatchObject({ quantity: '1 1/2 yards', name: 'Seam binding ribbon' });
    expect(parseSupplyLine('¼ yard lace trim').supply).toMatchObject({ quantity: '1/4 yard' });
    expect(parseSupplyLine('1 1/2 yards twine').supply).toMatchObject({ quantity: '1 1/2 yards', category: 'embellishment' });
    expect(parseSupplyLine('24" satin ribbon').supply).toMatchObject({ quantity: '24 in', name: 'Satin ribbon' });
  });

  it('leaves sizes, paper weights and words that start with a digit in the name', () => {
    expect(parseSupplyLine('12 x 12 in patterned paper').supply).toMatchObject({ quantity: '', name: '12 x 12 in patterned paper', category: 'paper' });
    expect(parseSupplyLine('12x12 kraft cardstock').supply).toMatchObject({ quantity: '', name: '12x12 kraft cardstock' });
    expect(parseSupplyLine('2 sheets 8.5 x 11 in white cardstock').supply).toMatchObject({ quantity: '2 sheets', name: '8.5 x 11 in white cardstock' });
    expect(parseSupplyLine('80 lb kraft cardstock').supply).toMatchObject({ quantity: '', name: '80 lb kraft cardstock' });
    expect(parseSupplyLine('3D foam squares').supply).toMatchObject({ quantity: '', name: '3D foam squares', category: 'adhesive' });
    expect(parseSupplyLine('patterned paper 6 x 6').supply).toMatchObject({ quantity: '', name: 'Patterned paper 6 x 6' });
  });

  it('keeps a length in front of a tool or an adhesive as its size, not an amount', () => {
    expect(parseSupplyLine('12 in paper trimmer').supply).toMatchObject({ quantity: '', name: '12 in paper trimmer', category: 'tool' });
    expect(parseSupplyLine('1/4 in double-sided tape').supply).toMatchObject({ quantity: '', name: '1/4 in double-sided tape', category: 'adhesive' });
    // A ribbon is bought by length.
    expect(parseSupplyLine('18 in velvet ribbon').supply).toMatchObject({ quantity: '18 in', name: 'Velvet ribbon' });
  });

  it('takes a trailing "x 2" as the quantity', () => {
    expect(parseSupplyLine('wooden clothespins x 6').supply).toMatchObject({ quantity: '6', name: 'Wooden clothespins', category: 'tool' });
    expect(parseSupplyLine('kraft tags (x3)').supply).toMatchObject({ quantity: '3', name: 'Kraft tags', note: '' });
  });

  it('splits off the shop link, wherever it sits on the line', () => {
    expect(parseSupplyLine('liquid glue - https://shop.example/glue').supply).toMatchObject({
      name: 'Liquid glue',
      url: 'https://shop.example/glue',
      category: 'adhesive',
      note: '',
    });
    expect(parseSupplyLine('https://shop.example/vellum 2 sheets vellum').supply).toMatchObject({
      name: 'Vellum',
      quantity: '2 sheets',
      url: 'https://shop.example/vellum',
    });
    expect(parseSupplyLine('foam tape (https://shop.example/foam-tape)').supply).toMatchObject({
      name: 'Foam tape',
      url: 'https://shop.example/foam-tape',
      note: '',
    });
    expect(parseSupplyLine('foam tape: www.shop.example/foam').supply).toMatchObject({ name: 'Foam tape', url: 'https://www.shop.example/foam' });
    expect(parseSupplyLine('[Scoring board](https://shop.example/board) for the walls').supply).toMatchObject({
      name: 'Scoring board for the walls',
      url: 'https://shop.example/board',
      category: 'tool',
    });
  });

  it('drops trailing punctuation from a link but keeps balanced brackets (GFM spec, extended autolink path validation)', () => {
    expect(parseSupplyLine('gold gems, see https://shop.example/gems.').supply?.url).toBe('https://shop.example/gems');
    expect(parseSupplyLine('brads https://shop.example/brads?colour=gold!').supply?.url).toBe('https://shop.example/brads?colour=gold');
    // GFM: "www.google.com/search?q=(business))+ok" keeps its balanced pair; an unbalanced closing bracket is dropped.
    expect(parseSupplyLine('twine (https://shop.example/twine_(natural))').supply?.url).toBe('https://shop.example/twine_(natural)');
  });

  it('splits off a discount code written with "code:" or "discount code"', () => {
    expect(parseSupplyLine('kraft cardstock https://shop.example/kraft code: JUNIPER10').supply).toMatchObject({
      name: 'Kraft cardstock',
      discountCode: 'JUNIPER10',
    });
    expect(parseSupplyLine('satin ribbon (discount code BOWS15)').supply).toMatchObject({ name: 'Satin ribbon', discountCode: 'BOWS15', note: '' });
    expect(parseSupplyLine('circle punch, use code ROUND5').supply).toMatchObject({ name: 'Circle punch', discountCode: 'ROUND5' });
    // "code" inside a name is left alone.
    expect(parseSupplyLine('QR code stickers').supply).toMatchObject({ name: 'QR code stickers', discountCode: null });
  });

  it('turns text after a spaced dash or in closing brackets into the note', () => {
    expect(parseSupplyLine('2 sheets kraft cardstock - for the box wall').supply).toMatchObject({ name: 'Kraft cardstock', note: 'for the box wall' });
    expect(parseSupplyLine('strong liquid glue (a fine nozzle helps)').supply).toMatchObject({ name: 'Strong liquid glue', note: 'a fine nozzle helps' });
    // A hyphen inside a word is not a separator.
    expect(parseSupplyLine('self-healing mat').supply).toMatchObject({ name: 'Self-healing mat', note: '', category: 'tool' });
  });

  it('strips list bullets and numbering', () => {
    expect(parseSupplyLine('- 2 sheets kraft cardstock').supply).toMatchObject({ quantity: '2 sheets', name: 'Kraft cardstock' });
    expect(parseSupplyLine('• bone folder').supply).toMatchObject({ name: 'Bone folder' });
    expect(parseSupplyLine('3. 4 bulldog clips').supply).toMatchObject({ quantity: '4', name: 'Bulldog clips' });
    expect(parseSupplyLine('- [ ] glue dots').supply).toMatchObject({ name: 'Glue dots', category: 'adhesive' });
  });

  it('says why a line cannot be added', () => {
    expect(parseSupplyLine('https://shop.example/glue')).toEqual({ supply: null, problem: 'Only a link on this line: write what the supply is before it' });
    expect(parseSupplyLine(' - ').problem).toBe('No supply name on this line');
    // The shared schema refuses names over 200 characters; the row is shown but not added.
    const long = parseSupplyLine(`kraft cardstock ${'x'.repeat(200)}`);
    expect(long.supply).not.toBeNull();
    expect(long.problem).toMatch(/^Name: /);
  });

  it('gives rows the create endpoint accepts (checked with the shared createSupplySchema)', () => {
    const lines = [
      '2 sheets kraft cardstock',
      'liquid glue - https://shop.example/glue',
      'a few clear gems (for the lid)',
      '12 in paper trimmer',
      'gold thread x 2',
    ];
    for (const l of lines) {
      const { supply, problem } = parseSupplyLine(l);
      expect(problem).toBeNull();
      expect(createSupplySchema.safeParse({ ...supply, url: supply!.url ?? undefined, discountCode: supply!.discountCode ?? undefined }).success).toBe(true);
    }
  });
});

describe('guessCategory', () => {
  it('lets the word that names the thing decide', () => {
    expect(guessCategory('Paper trimmer with a scoring blade')).toBe('tool');
    expect(guessCategory('Scissors for ribbon')).toBe('tool');
    expect(guessCategory('Glitter cardstock')).toBe('cardstock');
    expect(guessCategory('Gem glue')).toBe('adhesive');
    expect(guessCategory('Washi tape')).toBe('embellishment');
    expect(guessCategory('Hot glue gun')).toBe('tool');
    expect(guessCategory('Craft knife and self-healing mat')).toBe('tool');
    expect(guessCategory('Kraft cardstock, 12 x 12 in')).toBe('cardstock');
    expect(guessCategory('Patterned paper with gold foil')).toBe('paper');
    expect(guessCategory('Craft knives')).toBe('tool');
    expect(guessCategory('Punches')).toBe('tool');
  });
  it('falls back to any supply word, then to other', () => {
    expect(guessCategory('12 x 12 in patterned paper')).toBe('paper');
    expect(guessCategory('Distress ink in antique linen')).toBe('other');
    expect(guessCategory('Watercolour set')).toBe('other');
  });
});

describe('readLeadingQuantity', () => {
  it('returns null when the text does not start with an amount', () => {
    expect(readLeadingQuantity('kraft cardstock')).toBeNull();
    expect(readLeadingQuantity('an A4 sheet')).toBeNull();
    expect(readLeadingQuantity('tenterhooks')).toBeNull();
  });
  it('marks lengths so a tool size can be told apart', () => {
    expect(readLeadingQuantity('2 m jute twine')).toEqual({ quantity: '2 m', rest: 'jute twine', length: true });
    expect(readLeadingQuantity('2 mini brads')).toEqual({ quantity: '2', rest: 'mini brads', length: false });
  });
});

describe('parseSupplyLines', () => {
  it('reads one supply a line, skips blank lines and keeps the pasted line numbers', () => {
    const rows = parseSupplyLines('2 sheets kraft cardstock\r\n\n  liquid glue - https://shop.example/glue  \nhttps://shop.example/only-a-link\n');
    expect(rows.map((r) => [r.line, r.text, r.supply?.name ?? null, r.problem])).toEqual([
      [1, '2 sheets kraft cardstock', 'Kraft cardstock', null],
      [3, 'liquid glue - https://shop.example/glue', 'Liquid glue', null],
      [4, 'https://shop.example/only-a-link', null, 'Only a link on this line: write what the supply is before it'],
    ]);
  });
  it('reads nothing from an empty paste', () => {
    expect(parseSupplyLines('\n \n')).toEqual([]);
  });
});
