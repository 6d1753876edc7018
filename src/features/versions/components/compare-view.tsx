import { useEffect, useId, useRef, useState } from 'react';
import type { ChangeStatus, CompareDto, RowChangeDto, RowSectionDto, TextPartDto, TextRowDto, VersionKind } from '@shared/schemas/version';
import { Notice } from '@/components/ui/notice';
import { Loading } from '@/components/ui/spinner';
import { useCompare } from '../api/get-compare';
import { useVersions } from '../api/get-versions';

const BASES: { kind: VersionKind; label: string }[] = [
  { kind: 'published', label: 'Since it was published' },
  { kind: 'sent_back', label: 'Since it was sent back' },
  { kind: 'approved', label: 'Since it was approved' },
];

// The status in words, so a change never reads by colour alone.
const STATUS_WORDS: Record<ChangeStatus, string> = { same: 'unchanged', added: 'added', removed: 'taken out', changed: 'changed' };
const STATUS_TONE: Record<ChangeStatus, string> = {
  same: 'border-line text-pencil',
  added: 'border-sage/50 bg-sage-light text-ink',
  removed: 'border-rosehip/40 bg-rosehip-light text-rosehip',
  changed: 'border-kraft/40 bg-kraft-light text-kraft-dark',
};

const dateTime = (iso: string | null) => (iso ? new Date(iso).toLocaleString(undefined, { dateStyle: 'medium', timeStyle: 'short' }) : '');

function StatusTag({ status }: { status: ChangeStatus }) {
  return <span className={`inline-block rounded-full border px-2 py-0.5 text-xs font-medium ${STATUS_TONE[status]}`}>{STATUS_WORDS[status]}</span>;
}

/** A changed block's words: taken-out words struck through, new words underlined (and tinted). */
function Parts({ parts, side }: { parts: TextPartDto[]; side: 'before' | 'after' }) {
  return (
    <>
      {parts.map((p, i) =>
        p.removed && side === 'before' ? (
          <del key={i} className="bg-rosehip-light text-rosehip">
            {p.text}
          </del>
        ) : p.added && side === 'after' ? (
          <ins key={i} className="bg-sage-light text-ink underline">
            {p.text}
          </ins>
        ) : p.added || p.removed ? null : (
          <span key={i}>{p.text}</span>
        ),
      )}
    </>
  );
}

function TextRow({ row, fromLabel, toLabel }: { row: TextRowDto; fromLabel: string; toLabel: string }) {
  return (
    <li className="rounded-md border border-line bg-white p-3">
      <div className="flex flex-wrap items-center gap-2 text-sm">
        <span className="font-medium">{row.label}</span>
        <StatusTag status={row.status} />
      </div>
      <div className="mt-2 grid gap-3 text-sm md:grid-cols-2">
        <div>
          <p className="text-xs text-pencil">{fromLabel}</p>
          <p className="font-serif">
            {row.before === null ? <em className="text-pencil">not there</em> : row.beforeParts ? <Parts parts={row.beforeParts} side="before" /> : row.before}
          </p>
        </div>
        <div>
          <p className="text-xs text-pencil">{toLabel}</p>
          <p className="font-serif">
            {row.after === null ? <em className="text-pencil">taken out</em> : row.afterParts ? <Parts parts={row.afterParts} side="after" /> : row.after}
          </p>
        </div>
      </div>
    </li>
  );
}

function RowChange({ row, section }: { row: RowChangeDto; section: RowSectionDto }) {
  const shown = (values: Record<string, string> | null) =>
    section.fields
      .map((f) => (values?.[f.key] ? `${f.label}: ${values[f.key]}` : ''))
      .filter(Boolean)
      .join(' · ');
  return (
    <li className="rounded-md border border-line bg-white p-3 text-sm">
      <div className="flex flex-wrap items-center gap-2">
        <span className="font-medium">{row.name || 'Unnamed'}</span>
        <StatusTag status={row.status} />
      </div>
      {row.status === 'changed' ? (
        <dl className="mt-2 grid gap-1">
          {row.changes.map((c) => (
            <div key={c.field} className="grid gap-x-2 sm:grid-cols-[9rem_minmax(0,1fr)]">
              <dt className="text-pencil">{c.label}</dt>
              <dd className="break-words">
                <del className="bg-rosehip-light text-rosehip">{c.before || 'none'}</del> <span aria-hidden="true">→</span>
                <span className="sr-only"> now </span> <ins className="bg-sage-light text-ink underline">{c.after || 'none'}</ins>
              </dd>
            </div>
          ))}
        </dl>
      ) : (
        <p className="mt-1 break-words text-pencil">{shown(row.status === 'removed' ? row.before : row.after)}</p>
      )}
    </li>
  );
}

function Section({ title, count, children }: { title: string; count: number; children: React.ReactNode }) {
  const id = useId();
  if (count === 0) return null;
  return (
    <section aria-labelledby={id} className="mt-4">
      <h3 id={id} className="text-base">
        {title} <span className="text-sm font-normal text-pencil">({count === 1 ? '1 change' : `${count} changes`})</span>
      </h3>
      <ul className="mt-2 space-y-2">{children}</ul>
    </section>
  );
}

const changedRows = <R extends { status: ChangeStatus }>(s: { rows: R[] }) => s.rows.filter((r) => r.status !== 'same');

/** The comparison itself: each section's added, taken-out and changed rows, before beside after. */
export function CompareResult({ data }: { data: CompareDto }) {
  const fromLabel = `${data.from.label}${data.from.at ? `, ${dateTime(data.from.at)}` : ''}`;
  const toLabel = data.to.label;
  if (data.identical) return <Notice>No difference readers would see: {toLabel.toLowerCase()} matches this version.</Notice>;
  const rowSections: [string, RowSectionDto][] = [
    ['Title, video and disclosure', data.details],
    ['Cut list', data.cutList],
    ['Supplies', data.supplies],
    ['Chapters and stills', data.footage],
  ];
  return (
    <div>
      <p className="text-sm text-pencil">
        Comparing <strong className="text-ink">{fromLabel}</strong> with <strong className="text-ink">{toLabel}</strong>. Struck-through words were taken out;
        underlined words are new.
      </p>
      <Section title="Write-up" count={changedRows(data.writeUp).length}>
        {changedRows(data.writeUp).map((r, i) => (
          <TextRow key={`${r.label}-${i}`} row={r} fromLabel={data.from.label} toLabel={toLabel} />
        ))}
      </Section>
      {rowSections.map(([title, s]) => (
        <Section key={title} title={title} count={changedRows(s).length}>
          {changedRows(s).map((r) => (
            <RowChange key={r.id} row={r} section={s} />
          ))}
        </Section>
      ))}
    </div>
  );
}

/**
 * "What changed": the draft compared with what readers see, what was sent back or what was
 * approved (DESIGN.md T4). Shown only when there is a kept version to compare with.
 */
export function CompareView({ tutorialId, published }: { tutorialId: string; published: boolean }) {
  const versions = useVersions(tutorialId);
  const kinds = new Set((versions.data?.versions ?? []).map((v) => v.kind));
  const bases = BASES.filter((b) => (b.kind === 'published' ? published : kinds.has(b.kind)));
  const [picked, setPicked] = useState<VersionKind | null>(null);
  const from = picked && bases.some((b) => b.kind === picked) ? picked : (bases[0]?.kind ?? null);
  const compare = useCompare(tutorialId, from);
  const selectId = useId();
  const ref = useRef<HTMLElement>(null);
  // Reached from "See what changed" (…/publish#what-changed): scroll here once there is something to see.
  const loaded = Boolean(compare.data);
  useEffect(() => {
    if (loaded && window.location.hash === '#what-changed') ref.current?.scrollIntoView({ block: 'start' });
  }, [loaded]);
  if (versions.isPending || bases.length === 0) return null;
  return (
    <section ref={ref} id="what-changed" aria-labelledby="what-changed-title" className="rounded-lg border border-line bg-white p-5">
      <div className="flex flex-wrap items-center gap-3">
        <h2 id="what-changed-title" className="mr-auto text-lg">
          What changed
        </h2>
        <label htmlFor={selectId} className="text-sm">
          Compare the draft
        </label>
        <select
          id={selectId}
          value={from ?? ''}
          onChange={(e) => setPicked(e.target.value as VersionKind)}
          className="rounded-md border border-field bg-white px-2 py-1.5 text-sm"
        >
          {bases.map((b) => (
            <option key={b.kind} value={b.kind}>
              {b.label.toLowerCase()}
            </option>
          ))}
        </select>
      </div>
      <div className="mt-3">
        {compare.isPending && <Loading label="Comparing the two versions" />}
        {compare.error && <Notice kind="error">{compare.error.message}</Notice>}
        {compare.data && <CompareResult data={compare.data} />}
      </div>
    </section>
  );
}
