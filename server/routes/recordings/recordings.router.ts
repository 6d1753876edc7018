import { readFile } from 'node:fs/promises';
import { Router } from 'express';
import { fileTypeFromFile } from 'file-type';
import { Op } from 'sequelize';
import { idParams } from '@shared/schemas/studio';
import { createChapterSchema, createStillSchema, cueSearchQuery, updateChapterSchema, updateStillSchema, VIDEO_TYPES } from '@shared/schemas/footage';
import { parseTranscript, TranscriptParseError } from '@shared/transcript/parse';
import { suggestChapters } from '@shared/footage/suggest-chapters';
import { Chapter, Cue, Recording, Still, sequelize } from '../../models';
import { validate } from '../../middlewares/validate';
import { currentUser, requireUser } from '../../middlewares/authenticate';
import { discardUpload, singleUpload } from '../../middlewares/upload';
import { authorize } from '../../policies';
import { HttpError } from '../../lib/http-error';
import { loadChapter, loadRecording, loadStill, loadTutorial } from '../../services/access';
import { storage } from '../../services/storage';
import { enqueueRecording } from '../../jobs';
import { recordingKey } from '../../jobs/process-recording';
import { pullStill } from '../../services/stills';
import { presentChapter, presentRecording, presentStill } from './recording.presenter';

const TRANSCRIPT_MAX_BYTES = 5 * 1024 * 1024;

/** Upload and list recordings of a tutorial: mounted at /api/tutorials. */
export function tutorialRecordingsRouter(opts: { maxUploadBytes?: number } = {}) {
  const r = Router();
  r.use(requireUser);

  r.get('/:id/recordings', validate({ params: idParams }), async (req, res) => {
    const { tutorial, abilities } = await loadTutorial(req, req.params.id as string);
    authorize(abilities, 'read');
    const rows = await Recording.findAll({ where: { tutorialId: tutorial.id }, order: [['createdAt', 'DESC']] });
    res.json({ recordings: rows.map(presentRecording) });
  });

  // Access is checked before multer runs, so nobody without the right can fill the disk.
  r.post(
    '/:id/recordings',
    validate({ params: idParams }),
    async (req, _res, next) => {
      const { abilities } = await loadTutorial(req, req.params.id as string);
      authorize(abilities, 'update', 'Only people who can edit this tutorial can upload footage');
      next();
    },
    singleUpload({ what: 'recording', maxBytes: opts.maxUploadBytes }),
    async (req, res) => {
      const file = req.file!;
      const type = await fileTypeFromFile(file.path).catch(() => undefined);
      if (!type || !VIDEO_TYPES[type.mime]) {
        await discardUpload(req);
        throw new HttpError(415, `“${file.originalname}” is not a video Cardwright can use. Upload an MP4, MOV, WebM or MKV file.`);
      }
      const rec = Recording.build({
        tutorialId: req.params.id as string,
        uploadedById: currentUser(req).id,
        originalName: file.originalname.slice(0, 255),
        mime: type.mime,
        sizeBytes: file.size,
        sourceKey: '',
      });
      rec.sourceKey = recordingKey(rec.id, `source.${VIDEO_TYPES[type.mime]}`);
      await storage.adopt(file.path, rec.sourceKey);
      try {
        await rec.save();
        await enqueueRecording(rec.id);
      } catch (e) {
        await storage.remove(`recordings/${rec.id}`);
        await Recording.destroy({ where: { id: rec.id } });
        throw e;
      }
      res.status(201).json(presentRecording(rec));
    },
  );

  return r;
}

/** A recording, its transcript, chapters and stills: mounted at /api. */
export function recordingsRouter() {
  const r = Router();
  r.use(['/recordings', '/chapters', '/stills'], requireUser);

  r.get('/recordings/:id', validate({ params: idParams }), async (req, res) => {
    const { recording, abilities } = await loadRecording(req, req.params.id as string);
    authorize(abilities, 'read');
    res.json({ ...presentRecording(recording), abilities: { update: abilities.update } });
  });

  r.delete('/recordings/:id', validate({ params: idParams }), async (req, res) => {
    const { recording, abilities } = await loadRecording(req, req.params.id as string);
    authorize(abilities, 'update');
    await recording.destroy();
    await storage.remove(`recordings/${recording.id}`);
    res.status(204).end();
  });

  r.post(
    '/recordings/:id/transcript',
    validate({ params: idParams }),
    async (req, _res, next) => {
      const { abilities } = await loadRecording(req, req.params.id as string);
      authorize(abilities, 'update');
      next();
    },
    singleUpload({ what: 'transcript', maxBytes: TRANSCRIPT_MAX_BYTES }),
    async (req, res) => {
      const file = req.file!;
      const bytes = await readFile(file.path);
      await discardUpload(req);
      let text: string;
      try {
        text = new TextDecoder('utf-8', { fatal: true }).decode(bytes);
      } catch {
        throw new HttpError(422, 'The transcript is not UTF-8 text; save it as plain text (UTF-8) and upload it again', { line: null });
      }
      let parsed: ReturnType<typeof parseTranscript>;
      try {
        parsed = parseTranscript(text);
      } catch (e) {
        if (e instanceof TranscriptParseError) throw new HttpError(422, e.message, { line: e.line });
        throw e;
      }
      if (parsed.cues.length === 0) throw new HttpError(422, 'The transcript has no timed lines', { line: 1 });
      const recordingId = req.params.id as string;
      // Replace the old cues in one transaction, so a failure keeps the previous transcript.
      await sequelize.transaction(async (transaction) => {
        await Cue.destroy({ where: { recordingId }, transaction });
        await Cue.bulkCreate(
          parsed.cues.map((c, i) => ({ recordingId, position: i, startMs: c.startMs, endMs: c.endMs, text: c.text, identifier: c.identifier ?? null })),
          { transaction },
        );
        await Recording.update({ transcriptName: file.originalname.slice(0, 255), transcriptFormat: parsed.format }, { where: { id: recordingId }, transaction });
      });
      res.status(201).json({ format: parsed.format, cueCount: parsed.cues.length, name: file.originalname });
    },
  );

  r.delete('/recordings/:id/transcript', validate({ params: idParams }), async (req, res) => {
    const { recording, abilities } = await loadRecording(req, req.params.id as string);
    authorize(abilities, 'update');
    await sequelize.transaction(async (transaction) => {
      await Cue.destroy({ where: { recordingId: recording.id }, transaction });
      await recording.update({ transcriptName: null, transcriptFormat: null }, { transaction });
    });
    res.status(204).end();
  });

  r.get('/recordings/:id/cues', validate({ params: idParams, query: cueSearchQuery }), async (req, res) => {
    const { recording, abilities } = await loadRecording(req, req.params.id as string);
    authorize(abilities, 'read');
    const q = (req.query as { q?: string }).q;
    const where = q ? { recordingId: recording.id, text: { [Op.iLike]: `%${q.replace(/[%_\\]/g, '\\$&')}%` } } : { recordingId: recording.id };
    const cues = await Cue.findAll({ where, order: [['position', 'ASC']], attributes: ['id', 'position', 'startMs', 'endMs', 'text'] });
    res.json({ cues });
  });

  r.get('/recordings/:id/chapters', validate({ params: idParams }), async (req, res) => {
    const { recording, abilities } = await loadRecording(req, req.params.id as string);
    authorize(abilities, 'read');
    const rows = await Chapter.findAll({ where: { recordingId: recording.id }, order: [['startMs', 'ASC']] });
    res.json({ chapters: rows.map(presentChapter) });
  });

  r.get('/recordings/:id/chapter-suggestions', validate({ params: idParams }), async (req, res) => {
    const { recording, abilities } = await loadRecording(req, req.params.id as string);
    authorize(abilities, 'read');
    const [cues, chapters] = await Promise.all([
      Cue.findAll({ where: { recordingId: recording.id }, order: [['position', 'ASC']], attributes: ['startMs', 'text'] }),
      Chapter.findAll({ where: { recordingId: recording.id }, attributes: ['startMs'] }),
    ]);
    // A suggestion within 2 s of an existing chapter is already taken.
    const taken = chapters.map((c) => c.startMs);
    const suggestions = suggestChapters(cues).filter((s) => !taken.some((t) => Math.abs(t - s.startMs) < 2000));
    res.json({ suggestions });
  });

  r.post('/recordings/:id/chapters', validate({ params: idParams, body: createChapterSchema }), async (req, res) => {
    const { recording, abilities } = await loadRecording(req, req.params.id as string);
    authorize(abilities, 'update');
    if (recording.durationMs !== null && req.body.startMs > recording.durationMs) {
      throw new HttpError(400, 'startMs: That time is after the end of the video', { issues: [{ path: 'startMs', message: 'After the end of the video' }] });
    }
    const c = await Chapter.create({ recordingId: recording.id, title: req.body.title, startMs: req.body.startMs });
    res.status(201).json(presentChapter(c));
  });

  r.patch('/chapters/:id', validate({ params: idParams, body: updateChapterSchema }), async (req, res) => {
    const { chapter, recording, abilities } = await loadChapter(req, req.params.id as string);
    authorize(abilities, 'update');
    if (req.body.startMs !== undefined && recording.durationMs !== null && req.body.startMs > recording.durationMs) {
      throw new HttpError(400, 'startMs: That time is after the end of the video', { issues: [{ path: 'startMs', message: 'After the end of the video' }] });
    }
    await chapter.update(req.body);
    res.json(presentChapter(chapter));
  });

  r.delete('/chapters/:id', validate({ params: idParams }), async (req, res) => {
    const { chapter, abilities } = await loadChapter(req, req.params.id as string);
    authorize(abilities, 'update');
    await chapter.destroy();
    res.status(204).end();
  });

  r.get('/recordings/:id/stills', validate({ params: idParams }), async (req, res) => {
    const { recording, abilities } = await loadRecording(req, req.params.id as string);
    authorize(abilities, 'read');
    const rows = await Still.findAll({ where: { recordingId: recording.id }, order: [['atMs', 'ASC']] });
    res.json({ stills: rows.map(presentStill) });
  });

  r.post('/recordings/:id/stills', validate({ params: idParams, body: createStillSchema }), async (req, res) => {
    const { recording, abilities } = await loadRecording(req, req.params.id as string);
    authorize(abilities, 'update');
    const still = await pullStill(recording, req.body.atMs, req.body.mode);
    res.status(201).json(presentStill(still));
  });

  r.patch('/stills/:id', validate({ params: idParams, body: updateStillSchema }), async (req, res) => {
    const { still, abilities } = await loadStill(req, req.params.id as string);
    authorize(abilities, 'update');
    await still.update(req.body);
    res.json(presentStill(still));
  });

  r.delete('/stills/:id', validate({ params: idParams }), async (req, res) => {
    const { still, abilities } = await loadStill(req, req.params.id as string);
    authorize(abilities, 'update');
    await still.destroy();
    await storage.remove(still.fileKey);
    res.status(204).end();
  });

  return r;
}

