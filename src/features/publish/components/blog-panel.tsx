import { useEffect, useRef, useState } from 'react';
import { Button } from '@/components/ui/button';
import { Notice } from '@/components/ui/notice';
import { exportUrls } from '../api/export-urls';
import { useBlogExport } from '../api/get-blog-export';
import { useCopy } from '../hooks/use-copy';
import { copyHtml } from '../utils/clipboard';
import { CopyFeedback } from './copy-feedback';
import { DownloadButton } from './download-button';
import { ManualCopy } from './manual-copy';
import { Panel } from './panel';

/**
 * The blog-ready post (P1): a preview of the page as exported, "Copy HTML" for pasting into a
 * blog editor, and downloads of the page alone or zipped with its images. The preview is
 * sandboxed without scripts: the export has none, and a preview must never run any.
 */
export function BlogPanel({ tutorialId, slug }: { tutorialId: string; slug: string }) {
  const blog = useBlogExport(tutorialId);
  const copy = useCopy();
  // A changed export (after a save or a move) reloads the preview; the first answer does not,
  // since the preview loaded alongside it.
  const [version, setVersion] = useState(0);
  const seen = useRef<unknown>(undefined);
  useEffect(() => {
    if (!blog.data) return;
    if (seen.current !== undefined && seen.current !== blog.data) setVersion((v) => v + 1);
    seen.current = blog.data;
  }, [blog.data]);
  const onCopy = () =>
    void copy.run(async () => {
      const how = await copyHtml(blog.data!.html, blog.data!.text);
      return how === 'rich' ? 'Copied: paste into your blog editor' : 'Copied the HTML source: paste it into your blog’s HTML view';
    });

  return (
    <Panel
      id="blog"
      title="Blog post"
      intro="Clean HTML with no scripts: headings, the supplies and cut list as tables, numbered steps with their photos (sized, with alt text) and HowTo data for readers’ tools."
    >
      <div className="flex flex-wrap items-start gap-3">
        <div className="flex flex-col items-start gap-1">
          <Button onClick={onCopy} busy={blog.isPending} disabled={!blog.data}>
            {blog.isPending ? 'Preparing …' : 'Copy HTML'}
          </Button>
          <CopyFeedback state={copy.state} />
        </div>
        <DownloadButton label="Download zip" url={exportUrls.zip(tutorialId)} fallbackName={`${slug}.zip`} />
        <DownloadButton label="Download HTML" url={exportUrls.blogDownload(tutorialId)} fallbackName={`${slug}.html`} />
      </div>
      <p className="mt-1 text-xs text-pencil">
        The zip holds index.html with its images beside it, for a blog that takes uploads; the HTML file links the images on this server.
      </p>
      {blog.error && (
        <div className="mt-3">
          <Notice kind="error">The blog post could not be made: {blog.error.message}</Notice>
        </div>
      )}
      {copy.state.status === 'manual' && blog.data && <ManualCopy label="Blog post HTML" text={blog.data.html} reason={copy.state.message} rows={8} />}

      <div className="mt-4 overflow-hidden rounded-md border border-line">
        <div className="flex items-center justify-between border-b border-line bg-paper px-3 py-1.5 text-xs text-pencil">
          <span>Preview</span>
          <a href={exportUrls.blogPage(tutorialId)} target="_blank" rel="noopener" className="text-kraft-dark underline">
            Open in a new tab
          </a>
        </div>
        <iframe
          key={version}
          title="Blog post preview"
          src={exportUrls.blogPage(tutorialId)}
          sandbox="allow-same-origin allow-popups allow-popups-to-escape-sandbox"
          referrerPolicy="same-origin"
          loading="lazy"
          className="block h-[42rem] w-full bg-white"
        />
      </div>
    </Panel>
  );
}
