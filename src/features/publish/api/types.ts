import type { Transition, TutorialState } from '@shared/schemas/tutorial';

export type Paper = 'letter' | 'a4';

/** What the Publish section needs of a tutorial; the abilities are the server's, per move. */
export type PublishTutorial = {
  id: string;
  title: string;
  slug: string;
  state: TutorialState;
  videoUrl: string | null;
  publishedAt: string | null;
  abilities: Partial<Record<Transition | 'update' | 'read', boolean>>;
};

/** The blog export as JSON: the article fragment, its words as plain text and the HowTo data. */
export type BlogExport = { html: string; text: string; jsonLd: Record<string, unknown> };

/** The cutting template for one paper size: how many pages, or why there is none. */
export type TemplateInfo = { kind: 'ready'; pageCount: number } | { kind: 'empty'; message: string };

export type ChapterInfo = { title: string; startMs: number };
/** The chapters the description lists (those of the newest recording) and how long that recording runs. */
export type DescriptionChapters = { chapters: ChapterInfo[]; durationMs: number | null; hasRecording: boolean };
