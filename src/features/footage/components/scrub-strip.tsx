import { memo, useState, type PointerEvent as ReactPointerEvent } from 'react';
import type { ChapterDto, ThumbnailSheetsDto } from '@shared/schemas/footage';
import { useElementWidth } from '../hooks/use-element-width';
import { formatClock } from '../utils/format';
import { nearestThumbnail, tileBackground } from '../utils/timeline';

const STRIP_H = 52;
const PREVIEW_H = 90;

type Props = { thumbnails: ThumbnailSheetsDto | null; durationMs: number; timeMs: number; chapters: ChapterDto[]; onSeek: (ms: number) => void };

/**
 * A strip of scrub thumbnails under the player, cut from the server's sprite sheets. Hovering
 * shows the frame and time under the pointer; a click or a drag seeks there.
 */
export const ScrubStrip = memo(function ScrubStrip({ thumbnails, durationMs, timeMs, chapters, onSeek }: Props) {
  const [ref, width] = useElementWidth<HTMLDivElement>();
  const [hoverX, setHoverX] = useState<number | null>(null);
  const [dragging, setDragging] = useState(false);
  const timeAtX = (x: number) => (width > 0 && durationMs > 0 ? Math.max(0, Math.min(durationMs, (x / width) * durationMs)) : 0);
  const xOf = (ms: number) => (durationMs > 0 ? (ms / durationMs) * width : 0);
  const localX = (e: ReactPointerEvent<HTMLDivElement>) => e.clientX - e.currentTarget.getBoundingClientRect().left;

  const tileW = thumbnails ? (STRIP_H * thumbnails.tileWidth) / thumbnails.tileHeight : 0;
  const slots = thumbnails && width > 0 ? Math.ceil(width / tileW) : 0;
  const hoverMs = hoverX === null ? null : timeAtX(hoverX);
  const hoverTile = thumbnails && hoverMs !== null ? nearestThumbnail(thumbnails.atMs, hoverMs) : -1;
  const previewW = thumbnails ? (PREVIEW_H * thumbnails.tileWidth) / thumbnails.tileHeight : 64;

  return (
    <div className="relative select-none">
      <div
        ref={ref}
        role="slider"
        tabIndex={0}
        aria-label="Scrub through the video"
        aria-valuemin={0}
        aria-valuemax={Math.round(durationMs / 1000)}
        aria-valuenow={Math.round(timeMs / 1000)}
        aria-valuetext={`${formatClock(timeMs)} of ${formatClock(durationMs)}`}
        className="relative flex cursor-pointer overflow-hidden rounded-md border border-line bg-ink/80"
        style={{ height: STRIP_H }}
        onPointerMove={(e) => {
          const x = localX(e);
          setHoverX(x);
          if (dragging) onSeek(timeAtX(x));
        }}
        onPointerLeave={() => !dragging && setHoverX(null)}
        onPointerDown={(e) => {
          e.currentTarget.setPointerCapture(e.pointerId);
          setDragging(true);
          onSeek(timeAtX(localX(e)));
        }}
        onPointerUp={(e) => {
          setDragging(false);
          e.currentTarget.releasePointerCapture(e.pointerId);
        }}
      >
        {thumbnails &&
          Array.from({ length: slots }, (_, j) => {
            const i = nearestThumbnail(thumbnails.atMs, timeAtX((j + 0.5) * tileW));
            return <div key={j} className="shrink-0 bg-no-repeat opacity-90" style={tileBackground(i, thumbnails, STRIP_H)} aria-hidden />;
          })}
        {chapters.map((c) => (
          <div
            key={c.id}
            className="pointer-events-none absolute top-0 h-2.5 w-0.5 bg-paper"
            style={{ left: xOf(c.startMs) }}
            title={`${formatClock(c.startMs)} ${c.title}`}
            aria-hidden
          />
        ))}
        <div className="pointer-events-none absolute inset-y-0 left-0 bg-ink/35" style={{ width: Math.max(0, xOf(timeMs)) }} aria-hidden />
        <div
          className="pointer-events-none absolute inset-y-0 w-0.5 bg-kraft shadow-[0_0_0_1px_rgba(251,248,243,0.8)]"
          style={{ left: xOf(timeMs) - 1 }}
          aria-hidden
        />
        {hoverX !== null && <div className="pointer-events-none absolute inset-y-0 w-px bg-paper/80" style={{ left: hoverX }} aria-hidden />}
      </div>
      {hoverMs !== null && hoverX !== null && (
        <div
          className="pointer-events-none absolute bottom-full z-10 mb-2 overflow-hidden rounded-md border border-line bg-white shadow-md"
          style={{ left: Math.max(0, Math.min(width - previewW, hoverX - previewW / 2)), width: previewW }}
          aria-hidden
        >
          {thumbnails && hoverTile >= 0 && <div className="bg-no-repeat" style={tileBackground(hoverTile, thumbnails, PREVIEW_H)} />}
          <div className="px-2 py-0.5 text-center text-xs font-medium tabular-nums">{formatClock(hoverMs)}</div>
        </div>
      )}
    </div>
  );
});
