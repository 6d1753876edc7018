import { readFile, mkdir, stat } from 'node:fs/promises';
import path from 'node:path';
import { parseTranscript } from '@shared/transcript/parse';
import { Chapter, Cue, Recording, Still, type Tutorial, type User } from '../models';
import { generateDemoVideo } from '../services/media';
import { storage } from '../services/storage';
import { processRecording, recordingKey } from '../jobs/process-recording';
import { makeStill } from '../services/stills';

/** Scenes of the stand-in walkthrough; their times match round-box.vtt. */
const SCENES = [
  { title: 'Round keepsake box', color: '#A87B4F', seconds: 6 },
  { title: 'Cut the base circles', color: '#6E8B74', seconds: 8 },
  { title: 'Cut the wall strips', color: '#5B7A99', seconds: 10 },
  { title: 'Score and notch the tabs', color: '#8E6C8A', seconds: 8 },
  { title: 'Wrap and glue the wall', color: '#B5475B', seconds: 8 },
  { title: 'Make the lid', color: '#7A6A4F', seconds: 8 },
  { title: 'Add the label and mat', color: '#4F7A74', seconds: 7 },
];

const CHAPTERS = [
  { title: 'Introduction', startMs: 0 },
  { title: 'Cut the base circles', startMs: 6000 },
  { title: 'Cut the wall strips', startMs: 14000 },
  { title: 'Score and notch the tabs', startMs: 24000 },
  { title: 'Wrap and glue the wall', startMs: 32000 },
  { title: 'Make the lid', startMs: 40000 },
  { title: 'Add the label and mat', startMs: 48000 },
];

const STILLS = [
  {
    atMs: 8000,
    caption: 'Two base circles cut from kraft cardstock',
    alt: 'Two kraft cardstock circles, six and three eighths inches across, on a cutting mat',
  },
  { atMs: 17000, caption: 'The two wall strips, ready to score', alt: 'Two long kraft strips laid side by side' },
  { atMs: 30000, caption: 'Notches snipped up to the score line', alt: 'A scored strip with small notches along one edge' },
  { atMs: 42000, caption: 'The lid circle is a little larger than the base', alt: 'A slightly larger kraft circle over the base circle' },
];

/**
 * Gives the demo tutorial a real recording: a stand-in video made with ffmpeg (coloured scenes
 * with step titles and a tone), processed like any upload, with the transcript, chapters and
 * stills. Runs once: a tutorial that already has a recording is left alone.
 */
export async function seedDemoFootage(tutorial: Tutorial, uploader: User, log: (s: string) => void): Promise<void> {
  if (await Recording.findOne({ where: { tutorialId: tutorial.id }, attributes: ['id'] })) return;
  log('Making the demo recording with ffmpeg (a few seconds) ...');
  const rec = Recording.build({
    tutorialId: tutorial.id,
    uploadedById: uploader.id,
    originalName: 'round-keepsake-box.mp4',
    mime: 'video/mp4',
    sizeBytes: 0,
    sourceKey: '',
  });
  rec.sourceKey = recordingKey(rec.id, 'source.mp4');
  const source = storage.stagingPath(rec.sourceKey);
  await mkdir(path.dirname(source), { recursive: true });
  await generateDemoVideo(source, { scenes: SCENES, width: 1280, height: 720 });
  rec.sizeBytes = (await stat(source)).size;
  await storage.commit(rec.sourceKey, 'video/mp4');
  await rec.save();
  await processRecording(rec.id);

  const vtt = await readFile(path.join(import.meta.dirname, 'round-box.vtt'), 'utf8');
  const { cues, format } = parseTranscript(vtt);
  await Cue.bulkCreate(
    cues.map((c, i) => ({ recordingId: rec.id, position: i, startMs: c.startMs, endMs: c.endMs, text: c.text, identifier: c.identifier ?? null })),
  );
  await Recording.update({ transcriptName: 'round-keepsake-box.vtt', transcriptFormat: format }, { where: { id: rec.id } });
  await Chapter.bulkCreate(CHAPTERS.map((c) => ({ ...c, recordingId: rec.id })));
  const ready = await Recording.findByPk(rec.id);
  for (const s of STILLS) {
    // The seed runs ffmpeg itself, as it processed the recording above: with WORKERS=off no worker may be running yet.
    const still = await makeStill(ready!, s.atMs, 'exact');
    await Still.update({ caption: s.caption, alt: s.alt }, { where: { id: still.id } });
  }
  log('Demo recording, transcript, chapters and stills are in place.');
}
