import { exportUrls } from '../api/export-urls';
import { useTemplateInfo } from '../api/get-template-info';

const linkCls =
  'block rounded-md border border-line bg-white px-3 py-2 text-sm text-ink no-underline hover:border-kraft focus-visible:border-kraft [&>span]:block [&>span]:text-xs [&>span]:text-pencil';

/**
 * "Take it to the table": the handout (print view and PDFs) and the 1:1 cutting template (PDF and
 * every SVG page) of a published tutorial, for the people who make it. Plain links: the exports
 * of a published tutorial are open to anyone who may read it.
 */
export function ReaderDownloads({ tutorialId, videoUrl }: { tutorialId: string; videoUrl: string | null }) {
  const template = useTemplateInfo(tutorialId, 'letter');
  const pages = template.data?.kind === 'ready' ? template.data.pageCount : 0;
  return (
    <aside aria-labelledby="reader-downloads-title" className="space-y-3 rounded-lg border border-line bg-white p-4">
      <h2 id="reader-downloads-title" className="text-base">
        Take it to the table
      </h2>
      <ul className="space-y-2">
        <li>
          <a className={linkCls} href={exportUrls.printView(tutorialId, 'letter')}>
            Handout, print view<span>Photo, supplies, cut list and steps on Letter paper</span>
          </a>
        </li>
        <li>
          <a className={linkCls} href={exportUrls.handoutPdf(tutorialId, 'letter')}>
            Handout PDF (Letter)
          </a>
        </li>
        <li>
          <a className={linkCls} href={exportUrls.handoutPdf(tutorialId, 'a4')}>
            Handout PDF (A4)
          </a>
        </li>
        {pages > 0 && (
          <>
            <li>
              <a className={linkCls} href={exportUrls.templatePdf(tutorialId, 'letter')}>
                Cutting template PDF (Letter)<span>Every piece at actual size</span>
              </a>
            </li>
            <li>
              <a className={linkCls} href={exportUrls.templatePdf(tutorialId, 'a4')}>
                Cutting template PDF (A4)
              </a>
            </li>
            {Array.from({ length: pages }, (_, i) => i + 1).map((n) => (
              <li key={n}>
                <a className={linkCls} href={exportUrls.templateSvg(tutorialId, 'letter', n)}>
                  {pages === 1 ? 'Cutting template SVG' : `Cutting template SVG, page ${n} of ${pages}`}
                  <span>For cutting machines and drawing programs</span>
                </a>
              </li>
            ))}
          </>
        )}
        {videoUrl && (
          <li>
            <a className={linkCls} href={videoUrl} rel="noopener">
              Watch the video
            </a>
          </li>
        )}
      </ul>
      {pages > 0 && <p className="text-xs text-pencil">Print templates at 100% (actual size) and check the 1 in square with a ruler before cutting.</p>}
      <p className="text-xs text-pencil">
        Blades, hot glue and some adhesives can hurt: cut away from your hand on a mat, and follow the maker’s cautions and your own judgement.
      </p>
    </aside>
  );
}
