import { describe, expect, it } from 'vitest';
import { fileKindWords, notAVideoMessage } from './file-kind';

// Media types from the IANA media type registry (text/plain, image/png, audio/mpeg, application/pdf).
describe('what a file that is not a video is', () => {
  it('names it from its media type, else from its name', () => {
    expect(fileKindWords({ mime: 'text/plain' })).toBe('text');
    expect(fileKindWords({ mime: 'image/png' })).toBe('a picture (PNG)');
    expect(fileKindWords({ mime: 'audio/mpeg' })).toBe('sound only (MP3)');
    expect(fileKindWords({ mime: 'application/pdf' })).toBe('a PDF document');
    expect(fileKindWords({ mime: '', ext: 'srt' })).toBe('a transcript (text)');
    expect(fileKindWords({ mime: 'application/octet-stream', ext: 'bin' })).toBeNull();
  });
  it('says what it found before what to do', () => {
    expect(notAVideoMessage('talk.vtt', 'a transcript (text)')).toBe(
      '“talk.vtt” is a transcript (text), not a video. Upload the recording itself: an MP4, MOV, WebM or MKV file.',
    );
    expect(notAVideoMessage('x.bin', null)).toMatch(/^“x\.bin” is not a video Cardwright can read\. Upload/);
  });
});
