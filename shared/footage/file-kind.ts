/**
 * What a file that is not a video is, in words, so a refusal says what was found before what to
 * do ("“notes.mp4” is text, not a video"). Read from the type its bytes show (the server) or the
 * type and name the browser gives (the client).
 */
const BY_EXTENSION: Record<string, string> = {
  txt: 'text',
  vtt: 'a transcript (text)',
  srt: 'a transcript (text)',
  md: 'text',
  csv: 'a spreadsheet (text)',
  doc: 'a document',
  docx: 'a document',
  pdf: 'a PDF document',
  png: 'a picture',
  jpg: 'a picture',
  jpeg: 'a picture',
  gif: 'a picture',
  heic: 'a picture',
  webp: 'a picture',
  svg: 'a drawing (SVG)',
  mp3: 'sound only',
  wav: 'sound only',
  m4a: 'sound only',
  aac: 'sound only',
  ogg: 'sound only',
  zip: 'a zip archive',
};

/** "text", "a picture (PNG)", "sound only (MP3)", "a PDF document"; null when nothing tells. */
export function fileKindWords(o: { mime?: string | null; ext?: string | null }): string | null {
  const mime = (o.mime ?? '').toLowerCase();
  const sub = mime.split('/')[1]?.replace(/^x-/, '').toUpperCase();
  if (mime.startsWith('text/')) return 'text';
  if (mime.startsWith('image/')) return sub && sub.length <= 5 ? `a picture (${sub})` : 'a picture';
  if (mime.startsWith('audio/')) return sub && sub.length <= 5 ? `sound only (${sub === 'MPEG' ? 'MP3' : sub})` : 'sound only';
  if (mime === 'application/pdf') return 'a PDF document';
  if (mime === 'application/zip') return 'a zip archive';
  const ext = (o.ext ?? '').toLowerCase().replace(/^\./, '');
  return BY_EXTENSION[ext] ?? null;
}

/** The refusal of a file that is not a video: what it is, then what to upload. */
export function notAVideoMessage(name: string, kind: string | null): string {
  const found = kind ? `“${name}” is ${kind}, not a video.` : `“${name}” is not a video Cardwright can read.`;
  return `${found} Upload the recording itself: an MP4, MOV, WebM or MKV file.`;
}
