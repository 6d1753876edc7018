import { Router } from 'express';
import { idParams } from '@shared/schemas/studio';
import {
  createChapterSchema,
  createStillSchema,
  cueSearchQuery,
  updateChapterSchema,
  updateStillSchema,
  type ChaptersDto,
  type ChapterSuggestionsDto,
  type CuesDto,
  type RecordingsDto,
  type StillsDto,
} from '@shared/schemas/footage';
import { route } from '../../lib/route';
import { receiveFile, receiveUpload } from '../../middlewares/upload';
import { authorize } from '../../policies';
import { loadChapter, loadRecording, loadStill, loadTutorial } from '../../services/access';
import {
  addChapter,
  addRecording,
  chapterSuggestions,
  deleteChapter,
  findCues,
  importTranscript,
  listChapters,
  listRecordings,
  recordingUpload,
  removeRecording,
  removeTranscript,
  updateChapter,
} from '../../services/recordings';
import { listStills, pullStill, removeStill, updateStill } from '../../services/stills';
import { followChapter } from '../../services/write-up';
import { presentChapter, presentCue, presentRecording, presentStill } from '../../presenters/recording.presenter';

const TRANSCRIPT_MAX_BYTES = 5 * 1024 * 1024;

/** Upload and list recordings of a tutorial: mounted at /api/tutorials. */
export function tutorialRecordingsRouter(opts: { maxUploadBytes?: number } = {}) {
  const r = Router();

  r.get(
    '/:id/recordings',
    route({ params: idParams }, async ({ params, user, res }) => {
      const { tutorial, abilities } = await loadTutorial(user, params.id);
      authorize(abilities, 'readDraft', 'Readers see the published tutorial, not its workspace');
      res.json({ recordings: (await listRecordings(tutorial.id)).map(presentRecording) } satisfies RecordingsDto);
    }),
  );

  r.post(
    '/:id/recordings',
    route({ params: idParams }, async ({ params, user, req, res }) => {
      const { tutorial, abilities } = await loadTutorial(user, params.id);
      authorize(abilities, 'update', 'Only people who can edit this tutorial can upload footage');
      // Received only now, after the checks, so nobody without the right can fill the store.
      const { id, place } = recordingUpload();
      const upload = await receiveUpload(req, res, { what: 'recording', maxBytes: opts.maxUploadBytes, place });
      res.status(201).json(presentRecording(await addRecording({ id, tutorialId: tutorial.id, uploadedBy: user, upload })));
    }),
  );

  return r;
}

/** A recording, its transcript, chapters and stills: mounted at /api. */
export function recordingsRouter() {
  const r = Router();

  r.get(
    '/recordings/:id',
    route({ params: idParams }, async ({ params, user, res }) => {
      const { recording, abilities } = await loadRecording(user, params.id);
      authorize(abilities, 'readDraft', 'Readers see the published tutorial, not its workspace');
      res.json({ ...presentRecording(recording), abilities: { update: abilities.update } });
    }),
  );

  r.delete(
    '/recordings/:id',
    route({ params: idParams }, async ({ params, user, res }) => {
      const { recording, abilities } = await loadRecording(user, params.id);
      authorize(abilities, 'update');
      await removeRecording(recording);
      res.status(204).end();
    }),
  );

  r.post(
    '/recordings/:id/transcript',
    route({ params: idParams }, async ({ params, user, req, res }) => {
      const { recording, abilities } = await loadRecording(user, params.id);
      authorize(abilities, 'update');
      const file = await receiveFile(req, res, { what: 'transcript', maxBytes: TRANSCRIPT_MAX_BYTES });
      res.status(201).json(await importTranscript(recording, file));
    }),
  );

  r.delete(
    '/recordings/:id/transcript',
    route({ params: idParams }, async ({ params, user, res }) => {
      const { recording, abilities } = await loadRecording(user, params.id);
      authorize(abilities, 'update');
      await removeTranscript(recording);
      res.status(204).end();
    }),
  );

  r.get(
    '/recordings/:id/cues',
    route({ params: idParams, query: cueSearchQuery }, async ({ params, query, user, res }) => {
      const { recording, abilities } = await loadRecording(user, params.id);
      authorize(abilities, 'readDraft', 'Readers see the published tutorial, not its workspace');
      res.json({ cues: (await findCues(recording.id, query.q)).map(presentCue) } satisfies CuesDto);
    }),
  );

  r.get(
    '/recordings/:id/chapters',
    route({ params: idParams }, async ({ params, user, res }) => {
      const { recording, abilities } = await loadRecording(user, params.id);
      authorize(abilities, 'readDraft', 'Readers see the published tutorial, not its workspace');
      res.json({ chapters: (await listChapters(recording.id)).map(presentChapter) } satisfies ChaptersDto);
    }),
  );

  r.get(
    '/recordings/:id/chapter-suggestions',
    route({ params: idParams }, async ({ params, user, res }) => {
      const { recording, abilities } = await loadRecording(user, params.id);
      authorize(abilities, 'readDraft', 'Readers see the published tutorial, not its workspace');
      res.json({ suggestions: await chapterSuggestions(recording) } satisfies ChapterSuggestionsDto);
    }),
  );

  r.post(
    '/recordings/:id/chapters',
    route({ params: idParams, body: createChapterSchema }, async ({ params, body, user, res }) => {
      const { recording, abilities } = await loadRecording(user, params.id);
      authorize(abilities, 'update');
      res.status(201).json(presentChapter(await addChapter(recording, body)));
    }),
  );

  r.patch(
    '/chapters/:id',
    route({ params: idParams, body: updateChapterSchema }, async ({ params, body, user, res }) => {
      const { chapter, recording, tutorial, abilities } = await loadChapter(user, params.id);
      authorize(abilities, 'update');
      const before = chapter.startMs;
      const updated = await updateChapter(recording, chapter, body);
      if (updated.startMs !== before) await followChapter({ tutorial, user, chapterId: chapter.id, title: updated.title, startMs: updated.startMs });
      res.json(presentChapter(updated));
    }),
  );

  r.delete(
    '/chapters/:id',
    route({ params: idParams }, async ({ params, user, res }) => {
      const { chapter, tutorial, abilities } = await loadChapter(user, params.id);
      authorize(abilities, 'update');
      await deleteChapter(chapter);
      await followChapter({ tutorial, user, chapterId: chapter.id, title: chapter.title, startMs: null });
      res.status(204).end();
    }),
  );

  r.get(
    '/recordings/:id/stills',
    route({ params: idParams }, async ({ params, user, res }) => {
      const { recording, abilities } = await loadRecording(user, params.id);
      authorize(abilities, 'readDraft', 'Readers see the published tutorial, not its workspace');
      res.json({ stills: (await listStills(recording.id)).map(presentStill) } satisfies StillsDto);
    }),
  );

  r.post(
    '/recordings/:id/stills',
    route({ params: idParams, body: createStillSchema }, async ({ params, body, user, res }) => {
      const { recording, abilities } = await loadRecording(user, params.id);
      authorize(abilities, 'update');
      res.status(201).json(presentStill(await pullStill(recording, body.atMs, body.mode)));
    }),
  );

  r.patch(
    '/stills/:id',
    route({ params: idParams, body: updateStillSchema }, async ({ params, body, user, res }) => {
      const { still, abilities } = await loadStill(user, params.id);
      authorize(abilities, 'update');
      res.json(presentStill(await updateStill(still, body)));
    }),
  );

  r.delete(
    '/stills/:id',
    route({ params: idParams }, async ({ params, user, res }) => {
      const { still, abilities } = await loadStill(user, params.id);
      authorize(abilities, 'update');
      await removeStill(still);
      res.status(204).end();
    }),
  );

  return r;
}
