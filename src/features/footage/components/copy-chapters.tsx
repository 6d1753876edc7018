import { useEffect, useRef, useState } from 'react';
import { Button } from '@/components/ui/button';
import type { ChapterDto } from '@shared/schemas/footage';
import { chapterListProblems, chapterListText } from '../utils/chapters';

/**
 * Copies "0:00 Title" lines for a video description. Where the browser refuses the clipboard
 * (no permission, not a secure page) the text is shown selected, to copy by hand.
 */
export function CopyChapters({ chapters, durationMs }: { chapters: ChapterDto[]; durationMs: number }) {
  const [state, setState] = useState<'idle' | 'copied' | 'manual'>('idle');
  const area = useRef<HTMLTextAreaElement>(null);
  const text = chapterListText(chapters);
  const problems = chapterListProblems(chapters, durationMs);

  useEffect(() => {
    if (state === 'manual') area.current?.select();
    if (state !== 'copied') return;
    const t = setTimeout(() => setState('idle'), 2500);
    return () => clearTimeout(t);
  }, [state]);

  const copy = async () => {
    try {
      if (!navigator.clipboard?.writeText) throw new Error('no clipboard');
      await navigator.clipboard.writeText(text);
      setState('copied');
    } catch {
      setState('manual');
    }
  };

  return (
    <div>
      <div className="flex items-center gap-2">
        <Button variant="secondary" size="sm" onClick={copy} disabled={chapters.length === 0}>
          Copy chapter list
        </Button>
        <span className="text-xs text-sage" aria-live="polite">
          {state === 'copied' ? `Copied ${chapters.length} ${chapters.length === 1 ? 'line' : 'lines'}` : ''}
        </span>
      </div>
      {problems.length > 0 && (
        <p className="mt-1.5 text-xs text-pencil">
          Video sites usually list chapters only when the first is at 0:00, there are at least three and each lasts 10 seconds or more. Here{' '}
          {problems.join('; ')}.
        </p>
      )}
      {state === 'manual' && (
        <div className="mt-2">
          <p className="text-xs text-pencil">The browser did not allow copying. The list is selected below: press Ctrl+C (⌘C on a Mac) to copy it.</p>
          <textarea
            ref={area}
            readOnly
            aria-label="Chapter list"
            value={text}
            rows={Math.min(8, chapters.length)}
            className="mt-1 w-full rounded-md border border-field bg-paper px-2 py-1 font-mono text-xs"
            onBlur={() => setState('idle')}
          />
        </div>
      )}
    </div>
  );
}
