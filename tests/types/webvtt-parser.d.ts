// The W3C validator's WebVTT parser ships without types; only what the cross-check test uses.
declare module 'webvtt-parser' {
  export interface WebVTTCue {
    id: string;
    startTime: number;
    endTime: number;
    text: string;
  }
  export class WebVTTParser {
    constructor(entities?: Record<string, string>);
    parse(input: string, mode?: 'metadata' | 'chapters' | 'captions'): { cues: WebVTTCue[]; errors: { message: string; line: number }[] };
  }
}
