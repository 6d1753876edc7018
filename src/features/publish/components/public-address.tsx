import { Button } from '@/components/ui/button';
import { useCopy } from '../hooks/use-copy';
import { copyText } from '../utils/clipboard';
import { CopyFeedback } from './copy-feedback';
import { ManualCopy } from './manual-copy';

/** The published page's address with Open (a new tab) and Copy. */
export function PublicAddress({ url }: { url: string }) {
  const copy = useCopy();
  return (
    <div>
      <div className="flex flex-wrap items-center gap-2">
        <span className="text-sm font-medium">Public address</span>
        <code className="rounded border border-line bg-paper px-2 py-1 text-sm break-all">{url}</code>
        <a
          href={url}
          target="_blank"
          rel="noopener"
          className="inline-flex items-center rounded-md border border-line bg-white px-2.5 py-1 text-sm font-medium hover:border-kraft"
        >
          Open<span className="sr-only"> the public page (new tab)</span>
        </a>
        <Button
          variant="secondary"
          size="sm"
          onClick={() =>
            void copy.run(async () => {
              await copyText(url);
              return 'Copied the address';
            })
          }
        >
          Copy<span className="sr-only"> the public address</span>
        </Button>
        <CopyFeedback state={copy.state} />
      </div>
      {copy.state.status === 'manual' && <ManualCopy label="Public address" text={url} reason={copy.state.message} rows={1} />}
    </div>
  );
}
