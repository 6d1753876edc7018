import { EmptyState } from '@/components/ui/empty-state';

const TEXT: Record<string, { title: string; body: string }> = {
  footage: { title: 'No footage yet', body: 'This is where the recording, its timed transcript, chapters and stills will live.' },
  'cut-list': { title: 'No pieces yet', body: 'The cut list will gather every piece with its size, score lines and checks.' },
  supplies: { title: 'No supplies yet', body: 'Papers, cardstock, embellishments, adhesives and tools, with optional shop links.' },
  'write-up': { title: 'No write-up yet', body: 'The step-by-step tutorial, drafted from the chapters and transcript.' },
  publish: { title: 'Nothing to publish yet', body: 'Blog HTML, the class handout, the cutting template and the video description.' },
};

/** A section whose tools are not built yet says so plainly instead of pretending. */
export function SectionPlaceholder({ section }: { section: keyof typeof TEXT }) {
  const t = TEXT[section];
  return (
    <EmptyState title={t.title}>
      <p>{t.body}</p>
      <p className="mt-2">This section is not available yet in this version of Cardwright.</p>
    </EmptyState>
  );
}
