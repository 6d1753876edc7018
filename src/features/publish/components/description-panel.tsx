import { useEffect, useRef } from 'react';
import { Link } from 'react-router-dom';
import { Button } from '@/components/ui/button';
import { Notice } from '@/components/ui/notice';
import { Loading } from '@/components/ui/spinner';
import { exportUrls } from '../api/export-urls';
import { useDescription } from '../api/get-description';
import { useDescriptionChapters } from '../api/get-description-chapters';
import { useCopy } from '../hooks/use-copy';
import { chapterNotes } from '../utils/chapter-notes';
import { copyText } from '../utils/clipboard';
import { CopyFeedback } from './copy-feedback';
import { DownloadButton } from './download-button';
import { Panel } from './panel';

/**
 * The text for the video page (P4): the intro, the chapter list, supplies with their links and
 * the disclosure. Notes say when the chapter list will not be read as chapters by video sites.
 */
export function DescriptionPanel({ tutorialId, slug, footagePath }: { tutorialId: string; slug: string; footagePath: string }) {
  const text = useDescription(tutorialId);
  const chapters = useDescriptionChapters(tutorialId);
  const copy = useCopy();
  const area = useRef<HTMLTextAreaElement>(null);
  // Refused by the browser: the text is already on screen, so select it for Ctrl+C.
  useEffect(() => {
    if (copy.state.status !== 'manual') return;
    area.current?.focus();
    area.current?.select();
  }, [copy.state]);
  const notes = chapters.data ? chapterNotes(chapters.data.chapters, chapters.data.durationMs) : [];
  const noChapters = chapters.data && chapters.data.chapters.length === 0;

  return (
    <Panel
      id="description"
      title="Video description"
      intro="Paste it under the video: the chapter list, the supplies with their shop links, the disclosure and the link to the written tutorial."
    >
      {text.isPending ? (
        <Loading label="Writing the description" />
      ) : text.error ? (
        <Notice kind="error">The description could not be made: {text.error.message}</Notice>
      ) : (
        <>
          <textarea
            ref={area}
            readOnly
            aria-label="Video description text"
            value={text.data}
            rows={Math.min(18, Math.max(6, text.data.split('\n').length + 1))}
            className="w-full resize-y rounded-md border border-field bg-paper px-3 py-2 font-mono text-xs leading-relaxed"
          />
          <div className="mt-2 flex flex-wrap items-start gap-3">
            <div className="flex flex-col items-start gap-1">
              <Button
                variant="secondary"
                onClick={() =>
                  void copy.run(async () => {
                    await copyText(text.data);
                    return 'Copied the description';
                  })
                }
              >
                Copy
              </Button>
              <CopyFeedback state={copy.state} />
            </div>
            <DownloadButton label="Download .txt" url={exportUrls.descriptionDownload(tutorialId)} fallbackName={`${slug}.txt`} />
          </div>
          {copy.state.status === 'manual' && (
            <p role="alert" className="mt-1 text-xs text-rosehip">
              The browser did not allow copying ({copy.state.message.replace(/[.\s]+$/, '')}). The text is selected above: press Ctrl+C (⌘C on a Mac) to copy
              it.
            </p>
          )}
        </>
      )}
      {(notes.length > 0 || noChapters) && (
        <div className="mt-3 rounded-md border border-kraft/40 bg-kraft-light/50 px-3 py-2 text-sm" role="note" aria-label="About the chapter list">
          {noChapters ? (
            <p>
              No chapter list yet: {chapters.data!.hasRecording ? 'mark chapters' : 'upload the recording and mark chapters'} in{' '}
              <Link to={footagePath} className="font-medium text-kraft-dark underline">
                Footage
              </Link>{' '}
              and the description lists them.
            </p>
          ) : (
            <ul className="list-disc space-y-1 pl-5">
              {notes.map((n) => (
                <li key={n}>{n}</li>
              ))}
            </ul>
          )}
          {!noChapters && (
            <p className="mt-1 text-xs text-pencil">
              Chapters are edited in{' '}
              <Link to={footagePath} className="text-kraft-dark underline">
                Footage
              </Link>
              .
            </p>
          )}
        </div>
      )}
    </Panel>
  );
}
