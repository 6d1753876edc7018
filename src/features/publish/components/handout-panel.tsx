import { exportUrls } from '../api/export-urls';
import { usePaper } from '../hooks/use-paper';
import { DownloadButton } from './download-button';
import { Panel } from './panel';
import { PaperChoice } from './paper-choice';

/**
 * The printable class handout (P2) on Letter or A4: a PDF, or the print view in a new tab for
 * the browser's own print dialog. The QR code points to the public page once published, to the
 * video before that, and is left out when there is neither.
 */
export function HandoutPanel({ tutorialId, slug, hasQrTarget }: { tutorialId: string; slug: string; hasQrTarget: boolean }) {
  const [paper, setPaper] = usePaper('handout');
  return (
    <Panel
      id="handout"
      title="Handout"
      intro="For classes and the craft table: a photo, supplies, the cut list in fractions and millimetres, numbered steps with small photos and a QR code."
    >
      <PaperChoice name="handout-paper" label="Handout paper" value={paper} onChange={setPaper} />
      <div className="mt-3 flex flex-wrap items-start gap-3">
        <DownloadButton label="Download PDF" url={exportUrls.handoutPdf(tutorialId, paper)} fallbackName={`${slug}-handout-${paper}.pdf`} />
        <a
          href={exportUrls.printView(tutorialId, paper)}
          target="_blank"
          rel="noopener"
          className="inline-flex items-center rounded-md border border-line bg-white px-4 py-2 text-sm font-medium hover:border-kraft"
        >
          Open print view<span className="sr-only"> (new tab)</span>
        </a>
      </div>
      {!hasQrTarget && <p className="mt-2 text-xs text-pencil">No QR code yet: add the video address, or publish, and the handout gets one.</p>}
    </Panel>
  );
}
