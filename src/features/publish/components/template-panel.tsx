import { Link } from 'react-router-dom';
import { EmptyState } from '@/components/ui/empty-state';
import { Notice } from '@/components/ui/notice';
import { Loading } from '@/components/ui/spinner';
import { exportUrls } from '../api/export-urls';
import { useTemplateInfo } from '../api/get-template-info';
import { usePaper } from '../hooks/use-paper';
import { DownloadButton } from './download-button';
import { Panel } from './panel';
import { PaperChoice } from './paper-choice';

/**
 * The 1:1 cutting template (P3) as PDF, or SVG for cutting software; a template that needs more
 * than one sheet offers each SVG page. An empty cut list is said so, with the way to fill it.
 */
export function TemplatePanel({ tutorialId, slug, cutListPath }: { tutorialId: string; slug: string; cutListPath: string }) {
  const [paper, setPaper] = usePaper('template');
  const info = useTemplateInfo(tutorialId, paper);
  const pages = info.data?.kind === 'ready' ? info.data.pageCount : 0;

  return (
    <Panel
      id="template"
      title="Cutting template"
      intro="Every piece at actual size with its outline, material and grain; score lines dashed, notches marked; pieces larger than the page printed in parts that join A to A; a 1 in and a 25 mm test square on every page."
    >
      <PaperChoice name="template-paper" label="Template paper" value={paper} onChange={setPaper} />
      <div className="mt-3">
        {info.isPending ? (
          <Loading label="Laying out the template" />
        ) : info.error ? (
          <Notice kind="error">The template could not be made: {info.error.message}</Notice>
        ) : info.data.kind === 'empty' ? (
          <EmptyState
            title="The cut list is empty"
            action={
              <Link to={cutListPath} className="text-sm font-medium text-kraft-dark underline">
                Go to the Cut list
              </Link>
            }
          >
            The template draws the pieces of the cut list. Add them in the Cut list section and come back here.
          </EmptyState>
        ) : (
          <>
            <div className="flex flex-wrap items-start gap-3">
              <DownloadButton label="Download PDF" url={exportUrls.templatePdf(tutorialId, paper)} fallbackName={`${slug}-template-${paper}.pdf`} />
              {pages <= 1 && (
                <DownloadButton label="Download SVG" url={exportUrls.templateSvg(tutorialId, paper)} fallbackName={`${slug}-template-${paper}.svg`} />
              )}
            </div>
            {pages > 1 && (
              <div className="mt-3">
                <p className="text-sm">The template takes {pages} pages; SVG files hold one page each:</p>
                <ul className="mt-2 flex flex-wrap gap-3" aria-label="SVG pages">
                  {Array.from({ length: pages }, (_, i) => i + 1).map((n) => (
                    <li key={n}>
                      <DownloadButton
                        label={`SVG page ${n}`}
                        url={exportUrls.templateSvg(tutorialId, paper, n)}
                        fallbackName={`${slug}-template-${paper}-page-${n}.svg`}
                      />
                    </li>
                  ))}
                </ul>
              </div>
            )}
            <p className="mt-3 rounded-md border border-dashed border-kraft/60 bg-paper px-3 py-2 text-sm">
              Print at 100% (actual size) and check the 1 in square with a ruler before cutting; “fit to page” shrinks every piece.
            </p>
          </>
        )}
      </div>
    </Panel>
  );
}
