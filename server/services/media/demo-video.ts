import { existsSync } from 'node:fs';
import { mkdtemp, rm, writeFile } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import { join, resolve } from 'node:path';
import { ffmpegCommand, runFfmpeg } from './ffmpeg';
import { MediaError } from './media-error';

export type DemoScene = { title: string; color: string; seconds: number };
export type DemoVideoOptions = { scenes: DemoScene[]; width?: number; height?: number; fps?: number };

export const DEMO_FONT = process.env.DEMO_FONT || '/usr/share/fonts/truetype/dejavu/DejaVuSans-Bold.ttf';

// ffmpeg colour syntax we let through: a name, or #RRGGBB / 0xRRGGBB with optional alpha.
const COLOR = /^(?:[a-zA-Z]{3,30}|(?:#|0x)[0-9a-fA-F]{6}(?:[0-9a-fA-F]{2})?)$/;
// A rising scale, so each step sounds different when someone scrubs the seed video.
const TONES_HZ = [262, 294, 330, 349, 392, 440, 494, 523];

/**
 * Records a stand-in walkthrough with ffmpeg's lavfi sources: one coloured scene per step with its
 * title and "Step n of N" drawn in DejaVu Sans, a running clock, and a quiet sine tone that changes
 * pitch per scene. H.264 (veryfast) + AAC in mp4, a keyframe every 2 s, moov first. Default 640x360 at 25 fps.
 */
export async function generateDemoVideo(output: string, options: DemoVideoOptions): Promise<void> {
  const { scenes, width = 640, height = 360, fps = 25 } = options;
  if (scenes.length === 0) throw new MediaError('bad-input', 'A demo video needs at least one scene');
  if (width % 2 || height % 2 || width < 16 || height < 16) throw new MediaError('bad-input', 'Width and height must be even and at least 16');
  for (const s of scenes) {
    if (!COLOR.test(s.color)) throw new MediaError('bad-input', `'${s.color}' is not a colour ffmpeg understands (use a name or #RRGGBB)`);
    if (!(s.seconds > 0 && s.seconds <= 600)) throw new MediaError('bad-input', `Scene '${s.title}' must last between 0 and 600 seconds`);
  }

  // Titles go through text files so no quoting of ':' , '\' or '%' in the filter graph is needed.
  const work = await mkdtemp(join(tmpdir(), 'cardwright-demo-'));
  try {
    const font = existsSync(DEMO_FONT) ? `fontfile=${DEMO_FONT}` : 'font=Sans';
    const titleSize = (title: string) => Math.round(Math.min(height / 9, (width * 0.9) / (0.62 * Math.max(1, title.length))));
    const parts: string[] = [];
    for (const [i, s] of scenes.entries()) {
      const titleFile = join(work, `title-${i}.txt`);
      const stepFile = join(work, `step-${i}.txt`);
      await writeFile(titleFile, s.title.replace(/[\r\n]+/g, ' '));
      await writeFile(stepFile, `Step ${i + 1} of ${scenes.length}`);
      const d = s.seconds.toFixed(3);
      parts.push(
        `color=c=${s.color}:s=${width}x${height}:r=${fps}:d=${d},` +
          `drawtext=${font}:textfile=${titleFile}:expansion=none:fontcolor=white:fontsize=${titleSize(s.title)}:` +
          `box=1:boxcolor=black@0.35:boxborderw=${Math.round(height / 40)}:x=(w-text_w)/2:y=(h-text_h)/2,` +
          `drawtext=${font}:textfile=${stepFile}:expansion=none:fontcolor=white@0.85:fontsize=${Math.round(height / 20)}:x=(w-text_w)/2:y=h*0.7` +
          `[v${i}]`,
        `sine=f=${TONES_HZ[i % TONES_HZ.length]}:r=48000:d=${d},volume=0.15[a${i}]`,
      );
    }
    const clockFile = join(work, 'clock.txt');
    await writeFile(clockFile, '%{pts:hms}');
    const pairs = scenes.map((_, i) => `[v${i}][a${i}]`).join('');
    parts.push(
      `${pairs}concat=n=${scenes.length}:v=1:a=1[vc][a]`,
      `[vc]drawtext=${font}:textfile=${clockFile}:fontcolor=white@0.8:fontsize=${Math.round(height / 24)}:x=w-text_w-${Math.round(width / 40)}:y=${Math.round(height / 30)},format=yuv420p[v]`,
    );

    const command = ffmpegCommand()
      .complexFilter(parts.join(';'))
      .outputOptions([
        '-hide_banner',
        '-map',
        '[v]',
        '-map',
        '[a]',
        '-c:v',
        'libx264',
        '-preset',
        'veryfast',
        '-crf',
        '23',
        '-g',
        String(fps * 2),
        '-c:a',
        'aac',
        '-b:a',
        '96k',
        '-movflags',
        '+faststart',
        '-f',
        'mp4',
      ])
      .output(resolve(output));
    await runFfmpeg(command, 'The demo video could not be made', { paths: [work] });
  } finally {
    await rm(work, { recursive: true, force: true });
  }
}
