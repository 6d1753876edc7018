import { useCallback, useEffect, useRef, useState } from 'react';

export type PlayerApi = {
  /** Attach to the <video>. */
  ref: (el: HTMLVideoElement | null) => void;
  /** The playhead in ms, updated about ten times a second while playing (enough for cue timing). */
  timeMs: number;
  durationMs: number;
  playing: boolean;
  /** The exact playhead right now, for marking chapters and pulling stills. */
  now: () => number;
  seek: (ms: number) => void;
  nudge: (deltaMs: number) => void;
  toggle: () => void;
};

const STEP_MS = 100;

/** Follows a <video>'s playhead and offers seek and play controls to the panels around it. */
export function usePlayer(knownDurationMs: number | null): PlayerApi {
  const [video, setVideo] = useState<HTMLVideoElement | null>(null);
  const [timeMs, setTimeMs] = useState(0);
  const [durationMs, setDurationMs] = useState(knownDurationMs ?? 0);
  const [playing, setPlaying] = useState(false);
  const videoRef = useRef<HTMLVideoElement | null>(null);
  const ref = useCallback((el: HTMLVideoElement | null) => {
    videoRef.current = el;
    setVideo(el);
  }, []);

  useEffect(() => {
    if (!video) return;
    let frame = 0;
    const exact = () => Math.round(video.currentTime * 1000);
    const read = () => setTimeMs(exact());
    // While playing, a new value only every STEP_MS, so the panels re-render ten times a second,
    // not sixty. The value itself stays exact: a chapter marked at 0:21.330 must count as
    // started when the playhead is put back on it.
    const loop = () => {
      setTimeMs((old) => {
        const t = exact();
        return Math.floor(t / STEP_MS) === Math.floor(old / STEP_MS) ? old : t;
      });
      frame = requestAnimationFrame(loop);
    };
    const onPlay = () => {
      setPlaying(true);
      cancelAnimationFrame(frame);
      frame = requestAnimationFrame(loop);
    };
    const onPause = () => {
      setPlaying(false);
      cancelAnimationFrame(frame);
      read();
    };
    const onDuration = () => {
      if (Number.isFinite(video.duration)) setDurationMs(Math.round(video.duration * 1000));
    };
    const events: [string, () => void][] = [
      ['play', onPlay],
      ['pause', onPause],
      ['ended', onPause],
      ['seeked', read],
      ['seeking', read],
      ['timeupdate', read],
      ['loadedmetadata', onDuration],
      ['durationchange', onDuration],
    ];
    for (const [e, f] of events) video.addEventListener(e, f);
    onDuration();
    read();
    if (!video.paused) onPlay();
    return () => {
      cancelAnimationFrame(frame);
      for (const [e, f] of events) video.removeEventListener(e, f);
    };
  }, [video]);

  const now = useCallback(() => Math.round((videoRef.current?.currentTime ?? 0) * 1000), []);
  const seek = useCallback((ms: number) => {
    const v = videoRef.current;
    if (!v) return;
    const end = Number.isFinite(v.duration) ? v.duration : Infinity;
    v.currentTime = Math.max(0, Math.min(end, ms / 1000));
    setTimeMs(Math.round(Math.max(0, Math.min(end * 1000, ms))));
  }, []);
  const nudge = useCallback((delta: number) => seek(now() + delta), [seek, now]);
  const toggle = useCallback(() => {
    const v = videoRef.current;
    if (!v) return;
    if (v.paused || v.ended) void v.play().catch(() => {});
    else v.pause();
  }, []);

  return { ref, timeMs, durationMs, playing, now, seek, nudge, toggle };
}
