import { describe, expect, it } from 'vitest';
import { copyHtml, copyText, CopyRefusedError, type ClipboardEnv } from './clipboard';

class FakeItem {
  constructor(public items: Record<string, Blob>) {}
}

function env(opts: { write?: 'ok' | 'refuse' | 'none'; writeText?: 'ok' | 'refuse'; noItem?: boolean }) {
  const written: { items?: Record<string, Blob>; text?: string } = {};
  const clipboard = {
    writeText: async (t: string) => {
      if (opts.writeText === 'refuse') throw new DOMException('Write permission denied.', 'NotAllowedError');
      written.text = t;
    },
    ...(opts.write === 'none'
      ? {}
      : {
          write: async (items: ClipboardItem[]) => {
            if (opts.write === 'refuse') throw new DOMException('Write permission denied.', 'NotAllowedError');
            written.items = (items[0] as unknown as FakeItem).items;
          },
        }),
  };
  const e: ClipboardEnv = { clipboard, ClipboardItem: opts.noItem ? undefined : (FakeItem as unknown as ClipboardEnv['ClipboardItem']) };
  return { e, written };
}

const html = '<h1>Round keepsake box</h1><p>Score at <strong>1 in</strong>.</p>';
const text = 'Round keepsake box\nScore at 1 in.';

describe('copyHtml', () => {
  it('writes text/html and text/plain together (Clipboard API, W3C: ClipboardItem with several types)', async () => {
    const { e, written } = env({ write: 'ok' });
    expect(await copyHtml(html, text, e)).toBe('rich');
    expect(Object.keys(written.items!).sort()).toEqual(['text/html', 'text/plain']);
    expect(await written.items!['text/html']!.text()).toBe(html);
    expect(written.items!['text/html']!.type).toBe('text/html');
    expect(await written.items!['text/plain']!.text()).toBe(text);
    expect(written.text).toBeUndefined();
  });

  it('falls back to the HTML source as text when rich writing is refused', async () => {
    const { e, written } = env({ write: 'refuse' });
    expect(await copyHtml(html, text, e)).toBe('source');
    expect(written.text).toBe(html);
  });

  it('falls back when the browser has no ClipboardItem or no write()', async () => {
    for (const opts of [{ noItem: true }, { write: 'none' as const }]) {
      const { e, written } = env(opts);
      expect(await copyHtml(html, text, e)).toBe('source');
      expect(written.text).toBe(html);
    }
  });

  it('throws CopyRefusedError when both ways are refused', async () => {
    const { e } = env({ write: 'refuse', writeText: 'refuse' });
    await expect(copyHtml(html, text, e)).rejects.toBeInstanceOf(CopyRefusedError);
  });
});

describe('copyText', () => {
  it('throws CopyRefusedError without a clipboard (insecure page)', async () => {
    await expect(copyText('0:00 Supplies', {})).rejects.toBeInstanceOf(CopyRefusedError);
  });
});
