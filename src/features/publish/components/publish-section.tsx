import type { ReactNode } from 'react';
import type { TutorialDto } from '@shared/schemas/tutorial';
import { useRefreshExports } from '../api/refresh-exports';
import { BlogPanel } from './blog-panel';
import { DescriptionPanel } from './description-panel';
import { HandoutPanel } from './handout-panel';
import { Panel } from './panel';
import { SchedulePanel } from './schedule-panel';
import { StatusPanel, type OpenCommentLine } from './status-panel';
import { TemplatePanel } from './template-panel';
import { VideoUrlField } from './video-url-field';

/**
 * The whole Publish section: review status and moves, the video address, and every export (blog
 * post, handout, cutting template, video description). The page passes in what belongs to other
 * features: the public address (from the studio's slug), where the other sections live, and how
 * to save the tutorial and follow its moves.
 */
export function PublishSection(props: {
  tutorial: TutorialDto;
  /** The absolute public address the tutorial has (or will have) once published; null when unknown. */
  publicUrl: string | null;
  cutListPath: string;
  footagePath: string;
  onSaveVideoUrl: (url: string | null) => Promise<unknown>;
  onMoved?: (t: TutorialDto) => unknown;
  /** The open comments a send-back lists, and the review's checklist and history (other features). */
  openComments?: OpenCommentLine[];
  review?: ReactNode;
}) {
  const { tutorial } = props;
  const refresh = useRefreshExports(tutorial.id);
  return (
    <div className="space-y-6">
      <StatusPanel tutorial={tutorial} publicUrl={props.publicUrl} onMoved={props.onMoved} openComments={props.openComments} />
      <SchedulePanel tutorial={tutorial} onChanged={props.onMoved} />
      {props.review}
      <div className="grid grid-cols-1 gap-6 lg:grid-cols-[minmax(0,1fr)_24rem]">
        <BlogPanel tutorialId={tutorial.id} slug={tutorial.slug} />
        <div className="space-y-6">
          <Panel id="video" title="Video">
            <VideoUrlField
              value={tutorial.videoUrl}
              canEdit={Boolean(tutorial.abilities.update)}
              onSave={async (url) => {
                await props.onSaveVideoUrl(url);
                // The description, the post's video link and the handout's QR code all carry it.
                await refresh();
              }}
            />
          </Panel>
          <HandoutPanel tutorialId={tutorial.id} slug={tutorial.slug} hasQrTarget={tutorial.state === 'published' || Boolean(tutorial.videoUrl)} />
          <TemplatePanel tutorialId={tutorial.id} slug={tutorial.slug} cutListPath={props.cutListPath} />
        </div>
      </div>
      <DescriptionPanel tutorialId={tutorial.id} slug={tutorial.slug} footagePath={props.footagePath} />
    </div>
  );
}
