import { describe, expect, it } from 'vitest';
import { ApiError } from '@/lib/api-client';
import { looksLikeVideo, uploadErrorMessage } from './use-recording-upload';

describe('looksLikeVideo', () => {
  // Media types from the IANA registry (video/mp4 RFC 4337, video/quicktime, video/webm);
  // the server has the final word by reading the file's signature.
  it('lets through what the browser calls video, or what is named like one', () => {
    expect(looksLikeVideo({ name: 'box.MOV', type: '' })).toBe(true);
    expect(looksLikeVideo({ name: 'walkthrough', type: 'video/webm' })).toBe(true);
    expect(looksLikeVideo({ name: 'card.mkv', type: '' })).toBe(true);
  });
  it('stops a document or a picture before gigabytes are sent', () => {
    expect(looksLikeVideo({ name: 'notes.pdf', type: 'application/pdf' })).toBe(false);
    expect(looksLikeVideo({ name: 'poster.jpg', type: 'image/jpeg' })).toBe(false);
  });
});

describe('uploadErrorMessage', () => {
  it('passes the server’s words on, and says what to do about a file that is too large', () => {
    expect(uploadErrorMessage(new ApiError(415, '“a.mp4” is not a video Cardwright can use.'), 'a.mp4')).toBe('“a.mp4” is not a video Cardwright can use.');
    expect(uploadErrorMessage(new ApiError(413, 'The recording is larger than the 8 GB limit'), 'a.mp4')).toMatch(
      /^The recording is larger than the 8 GB limit\. Trim/,
    );
    expect(uploadErrorMessage(new ApiError(401, 'Sign in to continue'), 'a.mp4')).toMatch(/session has ended/);
    expect(uploadErrorMessage(new Error('boom'), 'a.mp4')).toBe('“a.mp4” could not be uploaded; please try again.');
  });
});
