import { execFile } from 'node:child_process';
import { mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { afterAll, describe, expect, it } from 'vitest';

const root = fileURLToPath(new URL('..', import.meta.url));
const dir = mkdtempSync(join(tmpdir(), 'measure-cli-'));
afterAll(() => rmSync(dir, { recursive: true, force: true }));

function file(name: string, body: string): string {
  const p = join(dir, name);
  writeFileSync(p, body);
  return p;
}

function run(...args: string[]): Promise<{ code: number; json: any; stdout: string }> {
  return new Promise((resolve) => {
    execFile('npx', ['tsx', 'scripts/measure.ts', ...args], { cwd: root, timeout: 60_000 }, (err, stdout) => {
      const code = err ? (typeof err.code === 'number' ? err.code : 1) : 0;
      let json: unknown;
      try {
        json = JSON.parse(stdout);
      } catch {
        json = null;
      }
      resolve({ code, json, stdout });
    });
  });
}

describe('measure CLI: text', () => {
  it('"ten and nine sixteenths" is one length of 10.5625 in', async () => {
    const r = await run('ten and nine sixteenths');
    expect(r.code).toBe(0);
    expect(r.json.mentions[0].kind).toBe('length');
    expect(r.json.mentions[0].inches).toEqual([10.5625]);
    expect(r.json.mentions[0].display).toEqual(['10 9/16 in']);
  });

  it('"two pieces" gives no mention', async () => {
    const r = await run('two pieces');
    expect(r).toMatchObject({ code: 0, json: { mentions: [] } });
  });

  it('a size, a score list and a metric length, with mm for the metric one', async () => {
    const r = await run('cut the base 4 1/4 by 5 1/2 and score it at 2 and at 4 then a 13 mm strip');
    expect(r.code).toBe(0);
    expect(r.json.mentions).toEqual([
      { kind: 'size', inches: [4.25, 5.5], approx: false, text: '4 1/4 by 5 1/2', display: ['4 1/4 in', '5 1/2 in'] },
      { kind: 'score', inches: [2, 4], approx: false, text: 'score it at 2 and at 4', display: ['2 in', '4 in'] },
      // 13 mm / 25.4 (NIST SP 811)
      { kind: 'length', inches: [13 / 25.4], approx: false, text: '13 mm', display: ['13 mm'], mm: [13] },
    ]);
  });

  it('bad arguments exit 2 with a JSON error', async () => {
    for (const args of [[], ['--unit', 'ft', 'four inches'], ['--nope']]) {
      const r = await run(...args);
      expect(r.code, args.join(' ')).toBe(2);
      expect(typeof r.json.error).toBe('string');
    }
  });
});

describe('measure CLI: transcripts', () => {
  it('reads a WebVTT file and times each mention, even one split over two cues', async () => {
    const vtt = file(
      'gift-box.vtt',
      'WEBVTT\n\n00:00:01.000 --> 00:00:04.000\nfor the round gift box cut the base um three and\n\n00:00:04.000 --> 00:00:07.500\na half inches across\n\n00:00:07.500 --> 00:00:09.000\nthen glue it for ten minutes\n',
    );
    const r = await run('--file', vtt);
    expect(r.code).toBe(0);
    expect(r.json.mentions).toEqual([
      { kind: 'diameter', inches: [3.5], approx: false, text: 'three and a half inches across', display: ['3 1/2 in'], startMs: 1000, endMs: 7500 },
    ]);
  });

  it('reads SRT and plain timed lines', async () => {
    const srt = file('card.srt', '1\n00:00:02,000 --> 00:00:05,000\nscore it at four and a quarter\n\n2\n00:00:05,000 --> 00:00:08,000\nthat is it\n');
    const r = await run('--file', srt);
    expect(r.json.mentions).toEqual([
      { kind: 'score', inches: [4.25], approx: false, text: 'score it at four and a quarter', display: ['4 1/4 in'], startMs: 2000, endMs: 5000 },
    ]);
    const plain = file('box.txt', '[0:05] a strip about ten and nine sixteenths long\n1:02:03 and a 3 inch circle\n');
    const p = await run('--file', plain);
    expect(p.json.mentions.map((m: { startMs: number; approx: boolean }) => [m.startMs, m.approx])).toEqual([
      [5000, true],
      [3_723_000, false],
    ]);
  });

  it('a malformed transcript exits 2 naming the line; a missing file exits 2', async () => {
    const bad = file('bad.vtt', 'WEBVTT\n\n00:01.000 --> nonsense\nhello\n');
    const r = await run('--file', bad);
    expect(r.code).toBe(2);
    expect(r.json.error).toMatch(/^line 3: /);
    const missing = await run('--file', join(dir, 'nope.vtt'));
    expect(missing.code).toBe(2);
    expect(missing.json.error).toContain('cannot read');
  });
});

describe('measure CLI: helpers', () => {
  it('wrap: the worked example gives 10 9/16 in', async () => {
    const r = await run('wrap', '--diameter', '6 3/8', '--pieces', '2', '--overlap', '1/2');
    expect(r.code).toBe(0);
    // 10 9/16 in x 25.4 = 268.2875 mm
    expect(r.json.stripLength).toEqual({ inches: 10.5625, display: '10 9/16 in', mm: 268.2875 });
    expect(r.json.working.length).toBeGreaterThan(3);
  });

  it('wrap reads spoken lengths and a caliper', async () => {
    const r = await run('wrap', '--diameter', 'six and three eighths', '--pieces', '2', '--overlap', 'half an inch', '--caliper', '0.012', '--precision', '32');
    expect(r.json.stripLength.display).toBe('10 9/16 in');
  });

  it('wrap refuses bad arguments', { timeout: 180_000 }, async () => {
    for (const args of [
      ['wrap'],
      ['wrap', '--diameter', 'lots'],
      ['wrap', '--diameter', '4', '--precision', '10'],
      ['wrap', '--diameter', '4', '--pieces', '0'],
    ]) {
      const r = await run(...args);
      expect(r.code, args.join(' ')).toBe(2);
      expect(typeof r.json.error).toBe('string');
    }
  });

  it('lid: a 4 in base with the default clearance gets a 4 1/16 in lid (common practice)', async () => {
    const r = await run('lid', '--diameter', '4');
    expect(r.json.lidDiameter).toEqual({ inches: 4.0625, display: '4 1/16 in', mm: 103.1875 });
  });

  it('card: A2 side fold is 8 1/2 x 5 1/2 scored at 4 1/4 (common practice)', async () => {
    const r = await run('card', '--size', '4 1/4 x 5 1/2', '--fold', 'side');
    expect(r.code).toBe(0);
    expect(r.json.flat.width.display).toBe('8 1/2 in');
    expect(r.json.flat.height.display).toBe('5 1/2 in');
    expect(r.json.scoreLines).toEqual([{ axis: 'width', at: { inches: 4.25, display: '4 1/4 in', mm: 107.95 } }]);
    const bad = await run('card', '--size', '4 1/4', '--fold', 'side');
    expect(bad.code).toBe(2);
  });
});

describe('measure CLI: plan', () => {
  it('lays four A2 panels on one 12 x 12 sheet', async () => {
    const f = file(
      'plan.json',
      JSON.stringify({ sheet: { width: '12', height: '12' }, rotate: true, kits: 1, pieces: [{ name: 'panel', width: '4 1/4', height: '5 1/2', qty: 4 }] }),
    );
    const r = await run('plan', '--file', f);
    expect(r.code).toBe(0);
    expect(r.json.sheets).toBe(1);
    expect(r.json.placements).toHaveLength(4);
    expect(r.json.placements[0]).toEqual({ sheet: 0, name: 'panel', x: 0, y: 0, width: 4.25, height: 5.5, rotated: false });
    expect(r.json.waste).toBeCloseTo(1 - (4 * 4.25 * 5.5) / 144, 12);
  });

  it('accepts a named sheet and reports a piece too big for it', async () => {
    const f = file(
      'plan2.json',
      JSON.stringify({
        sheet: 'letter',
        rotate: false,
        kits: 2,
        spares: 1,
        pieces: [
          { name: 'wall', width: '20', height: '2', qty: 1 },
          { name: 'tag', width: 2, height: '3 1/2' },
        ],
      }),
    );
    const r = await run('plan', '--file', f);
    expect(r.code).toBe(0);
    expect(r.json.placements).toHaveLength(3);
    expect(r.json.errors).toEqual([{ name: 'wall', count: 3, reason: '"wall" (20 in x 2 in) is larger than the 8 1/2 in x 11 in sheet (turning is off)' }]);
  });

  it('invalid files exit 2 with a clear error', async () => {
    const cases: [string, RegExp][] = [
      ['{"sheet":{"width":"12","height":"12"},"pieces":[]}', /pieces/],
      ['{"sheet":{"width":"12","height":"12"},"pieces":[{"name":"x","width":"lots","height":"2"}]}', /pieces\.0\.width: cannot read "lots"/],
      ['{"sheet":"a9","pieces":[{"name":"x","width":"1","height":"2"}]}', /unknown sheet size/],
      ['not json', /not valid JSON/],
    ];
    for (const [body, re] of cases) {
      const r = await run('plan', '--file', file('bad-plan.json', body));
      expect(r.code, body).toBe(2);
      expect(r.json.error).toMatch(re);
    }
  });
});
