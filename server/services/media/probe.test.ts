import { execFile } from 'node:child_process';
import { copyFile, readFile, rm, stat, writeFile } from 'node:fs/promises';
import { join } from 'node:path';
import { promisify } from 'node:util';
import sharp from 'sharp';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { FFMPEG_PATH } from './ffmpeg';
import { MediaError, shortDetail } from './media-error';
import { probe } from './probe';
import { ffmpegMake, tempDir } from './test-clips';

let dir: string;
let clip: string;

beforeAll(async () => {
  dir = await tempDir();
  // 2 s of 320x240 at 25 fps with a 440 Hz tone: the values probe() must give back.
  clip = await ffmpegMake(join(dir, 'clip.mp4'), [
    '-f',
    'lavfi',
    '-i',
    'testsrc2=s=320x240:r=25:d=2',
    '-f',
    'lavfi',
    '-i',
    'sine=f=440:r=48000:d=2',
    '-c:v',
    'libx264',
    '-preset',
    'ultrafast',
    '-pix_fmt',
    'yuv420p',
    '-c:a',
    'aac',
    '-shortest',
  ]);
});
afterAll(() => rm(dir, { recursive: true, force: true }));

async function refused(path: string): Promise<MediaError> {
  const e = await probe(path).then(
    () => null,
    (err: unknown) => err,
  );
  expect(e).toBeInstanceOf(MediaError);
  return e as MediaError;
}

describe('probe (values as made by ffmpeg lavfi; ffprobe JSON output)', () => {
  it('reads duration, size, frame rate, codecs and file size of a real clip', async () => {
    const info = await probe(clip);
    expect(info.durationMs).toBeGreaterThanOrEqual(1990);
    expect(info.durationMs).toBeLessThanOrEqual(2050); // AAC priming may add a few ms
    expect(info).toMatchObject({ width: 320, height: 240, frameRate: 25, videoCodec: 'h264', audioCodec: 'aac', hasAudio: true });
    expect(info.sizeBytes).toBe((await stat(clip)).size);
    expect(info.formatName).toContain('mp4');
  });

  it('a silent clip has no audio codec', async () => {
    const silent = await ffmpegMake(join(dir, 'silent.mkv'), [
      '-f',
      'lavfi',
      '-i',
      'testsrc2=s=160x90:r=30000/1001:d=1',
      '-c:v',
      'libx264',
      '-preset',
      'ultrafast',
    ]);
    expect(await probe(silent)).toMatchObject({ hasAudio: false, audioCodec: null, width: 160, height: 90, frameRate: 29.97, formatName: 'matroska,webm' });
  });

  it('reports the displayed size of footage a phone recorded turned a quarter (rotation side data)', async () => {
    const turned = await ffmpegMake(join(dir, 'turned.mp4'), ['-i', clip, '-c', 'copy', '-metadata:s:v:0', 'rotate=90']);
    expect(await probe(turned)).toMatchObject({ width: 240, height: 320 });
  });

  it('finds the length of a webm recorded to a stream, which carries no duration (like a browser recording)', async () => {
    const piped = join(dir, 'piped.webm');
    const { stdout } = await promisify(execFile)(
      FFMPEG_PATH,
      ['-v', 'error', '-f', 'lavfi', '-i', 'testsrc2=s=160x120:r=25:d=2', '-c:v', 'libvpx', '-deadline', 'realtime', '-f', 'webm', 'pipe:1'],
      { encoding: 'buffer', maxBuffer: 64 * 1024 * 1024 },
    );
    await writeFile(piped, stdout);
    expect((await probe(piped)).durationMs).toBe(2000);
  });

  it('refuses a truncated mp4 (its first 2 KB) with a readable reason and no file path', async () => {
    const cut = join(dir, 'cut.mp4');
    await writeFile(cut, (await readFile(clip)).subarray(0, 2048));
    const e = await refused(cut);
    expect(e.code).toBe('unreadable');
    expect(e.reason).toMatch(/^This file could not be read as a video: /);
    expect(e.reason).not.toContain(dir);
    expect(e.reason.length).toBeLessThan(260);
  });

  it('refuses a text file renamed .mp4, a missing file, a picture and a sound-only file', async () => {
    const text = join(dir, 'notes.mp4');
    await writeFile(text, 'Round gift box: cut a 4 in circle.\nScore the strip at 1/2 in.\n');
    expect((await refused(text)).reason).toMatch(/^This file could not be read as a video/);
    expect((await refused(join(dir, 'nothing-here.mp4'))).reason).toBe('This file could not be read as a video: the file was not found');

    const png = join(dir, 'photo.mp4');
    await sharp({ create: { width: 8, height: 8, channels: 3, background: '#6E8B74' } })
      .png()
      .toFile(png);
    expect((await refused(png)).code).toBe('not-a-video');

    const sound = await ffmpegMake(join(dir, 'tone.m4a'), ['-f', 'lavfi', '-i', 'sine=d=1', '-c:a', 'aac']);
    await copyFile(sound, join(dir, 'tone.mp4'));
    expect((await refused(join(dir, 'tone.mp4'))).reason).toBe('This file holds only sound, no video');
  });
});

describe('shortDetail', () => {
  it('keeps the error lines, drops progress and the file path, and stays short', () => {
    const stderr = [
      'frame=   10 fps=0.0 q=0.0 size=N/A time=00:00:00.40',
      '[mov,mp4,m4a,3gp,3g2,mj2 @ 0x55] moov atom not found',
      '/media/u/abc.mp4: Invalid data found when processing input',
    ].join('\r\n');
    expect(shortDetail(stderr, ['/media/u/abc.mp4'])).toBe('moov atom not found; Invalid data found when processing input');
    expect(shortDetail('x'.repeat(500)).length).toBe(200);
  });
});
