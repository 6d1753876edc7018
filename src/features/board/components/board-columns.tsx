import { useState } from 'react';
import { Link } from 'react-router-dom';
import { DndContext, PointerSensor, useDraggable, useDroppable, useSensor, useSensors, type DragEndEvent } from '@dnd-kit/core';
import type { BoardCardDto, BoardColumnDto } from '@shared/schemas/board';
import { STATE_LABELS, TRANSITIONS, type Transition, type TutorialState } from '@shared/schemas/tutorial';
import { Button } from '@/components/ui/button';
import { ConfirmDialog } from '@/components/ui/confirm';
import { Notice } from '@/components/ui/notice';
import { useMoveCard } from '../api/board';

/** The move that takes a card from its state to a column, if there is one. */
export function moveTo(from: TutorialState, to: TutorialState): Transition | null {
  const hit = (Object.keys(TRANSITIONS) as Transition[]).find((a) => TRANSITIONS[a].to === to && (TRANSITIONS[a].from as readonly string[]).includes(from));
  return hit ?? null;
}

const shortDay = (d: string) =>
  new Intl.DateTimeFormat(undefined, { weekday: 'short', day: 'numeric', month: 'short', timeZone: 'UTC' }).format(new Date(`${d}T00:00:00Z`));
const when = (iso: string, timeZone: string) =>
  new Intl.DateTimeFormat(undefined, { day: 'numeric', month: 'short', hour: '2-digit', minute: '2-digit', timeZone }).format(new Date(iso));

function Card(props: {
  card: BoardCardDto;
  timeZone: string;
  tutorialPath: (id: string) => string;
  onMove: (c: BoardCardDto, a: Transition) => void;
  busy: boolean;
}) {
  const { card: c } = props;
  const drag = useDraggable({ id: c.id, disabled: c.moves.length === 0, data: { card: c } });
  const [open, setOpen] = useState(false);
  const style = drag.transform
    ? { transform: `translate(${drag.transform.x}px, ${drag.transform.y}px)`, zIndex: 10, position: 'relative' as const }
    : undefined;
  const late = c.due?.kind === 'overdue';
  return (
    <li
      ref={drag.setNodeRef}
      style={style}
      {...drag.listeners}
      data-card={c.id}
      aria-label={c.title}
      className={`rounded-md border bg-white p-3 text-sm shadow-sm ${late ? 'border-rosehip' : 'border-line'} ${c.moves.length ? 'cursor-grab' : ''} ${drag.isDragging ? 'opacity-80 shadow-lg' : ''}`}
    >
      <Link to={props.tutorialPath(c.id)} className="font-medium underline-offset-2 hover:underline">
        {c.title}
      </Link>
      <p className="text-xs text-pencil">{c.maker ? c.maker.name : 'No maker'}</p>
      {c.dueDate && (
        <p className="mt-1 text-xs">
          Due {shortDay(c.dueDate)}
          {c.due && <strong className={`ml-1 ${late ? 'text-rosehip' : 'text-kraft-dark'}`}>· {c.due.words}</strong>}
        </p>
      )}
      {c.publishAt && (
        <p className="text-xs">
          Publishes {when(c.publishAt, props.timeZone)} ({c.publishTimeZone})
        </p>
      )}
      <p className="mt-1 text-xs text-pencil">
        Changed {when(c.lastChange.at, props.timeZone)}
        {c.lastChange.what && ` · ${c.lastChange.what}${c.lastChange.by ? ` by ${c.lastChange.by}` : ''}`}
      </p>
      <p className="text-xs">{c.openComments === 0 ? 'No open comments' : `${c.openComments} open ${c.openComments === 1 ? 'comment' : 'comments'}`}</p>
      {c.moves.length > 0 && (
        <div className="mt-2">
          <button
            type="button"
            className="rounded border border-field px-2 py-0.5 text-xs hover:bg-kraft-light"
            aria-expanded={open}
            onPointerDown={(e) => e.stopPropagation()}
            onClick={() => setOpen((o) => !o)}
          >
            Move <span className="sr-only">“{c.title}”</span>…
          </button>
          {open && (
            <ul className="mt-1 flex flex-wrap gap-1" aria-label={`Moves for ${c.title}`}>
              {c.moves.map((a) => (
                <li key={a}>
                  <Button
                    size="sm"
                    variant={a === 'sendBack' || a === 'unpublish' ? 'danger' : 'secondary'}
                    disabled={props.busy}
                    onPointerDown={(e) => e.stopPropagation()}
                    onClick={() => {
                      setOpen(false);
                      props.onMove(c, a);
                    }}
                  >
                    {TRANSITIONS[a].label} → {STATE_LABELS[TRANSITIONS[a].to]}
                  </Button>
                </li>
              ))}
            </ul>
          )}
        </div>
      )}
    </li>
  );
}

function Column(props: { column: BoardColumnDto; dragging: BoardCardDto | null; children: React.ReactNode }) {
  const drop = useDroppable({ id: props.column.state });
  const d = props.dragging;
  const target = d && d.state !== props.column.state ? moveTo(d.state, props.column.state) : null;
  const allowed = target !== null && d !== null && d.moves.includes(target);
  return (
    <section
      ref={drop.setNodeRef}
      aria-labelledby={`col-${props.column.state}`}
      data-column={props.column.state}
      className={`flex min-w-0 flex-col rounded-lg border p-2 ${allowed && drop.isOver ? 'border-kraft bg-kraft-light' : allowed ? 'border-dashed border-kraft bg-white/60' : 'border-line bg-white/40'} ${d && !allowed && d.state !== props.column.state ? 'opacity-60' : ''}`}
    >
      <h2 id={`col-${props.column.state}`} className="mb-2 flex items-baseline justify-between px-1 font-sans text-sm font-semibold">
        <span className="capitalize">{props.column.label}</span>
        <span className="text-xs font-normal text-pencil">
          {props.column.cards.length} {props.column.cards.length === 1 ? 'tutorial' : 'tutorials'}
        </span>
      </h2>
      {d && d.state !== props.column.state && (
        <p className="mb-1 px-1 text-xs">{allowed ? `Drop here: ${TRANSITIONS[target!].label}` : 'Not a move you can make'}</p>
      )}
      {props.children}
    </section>
  );
}

/**
 * The board's columns, one a review state. A card moves by dragging it to another column or with
 * its "Move…" button (keyboard and touch); either way only the moves the server allows the caller
 * are offered, and a move is the same review move as the Publish section's buttons. Sending back
 * asks for a note; unpublishing asks first.
 */
export function BoardColumns(props: { columns: BoardColumnDto[]; timeZone: string; tutorialPath: (id: string) => string }) {
  const move = useMoveCard();
  const sensors = useSensors(useSensor(PointerSensor, { activationConstraint: { distance: 6 } }));
  const [dragging, setDragging] = useState<BoardCardDto | null>(null);
  const [pending, setPending] = useState<{ card: BoardCardDto; action: Transition } | null>(null);
  const [note, setNote] = useState('');
  const [said, setSaid] = useState<string | null>(null);

  const run = (card: BoardCardDto, action: Transition, withNote?: string) => {
    setSaid(null);
    move.mutate(
      { id: card.id, action, note: withNote?.trim() || undefined },
      {
        onSuccess: (t) => {
          setPending(null);
          setNote('');
          setSaid(`Moved “${card.title}” to ${STATE_LABELS[t.state]}.`);
        },
      },
    );
  };
  const ask = (card: BoardCardDto, action: Transition) => (action === 'sendBack' || action === 'unpublish' ? setPending({ card, action }) : run(card, action));

  const onDragEnd = (e: DragEndEvent) => {
    const card = dragging;
    setDragging(null);
    if (!card || !e.over || e.over.id === card.state) return;
    const to = e.over.id as TutorialState;
    const action = moveTo(card.state, to);
    if (!action || !card.moves.includes(action)) {
      setSaid(`“${card.title}” cannot move from ${STATE_LABELS[card.state]} to ${STATE_LABELS[to]}: that is not a move you can make.`);
      return;
    }
    ask(card, action);
  };

  return (
    <div>
      <div className="mb-2 space-y-2" aria-live="polite">
        {said && <Notice kind={said.includes('cannot') ? 'info' : 'success'}>{said}</Notice>}
        {move.error && <Notice kind="error">{move.error.message}</Notice>}
      </div>
      <DndContext
        sensors={sensors}
        onDragStart={(e) => setDragging((e.active.data.current as { card: BoardCardDto }).card)}
        onDragCancel={() => setDragging(null)}
        onDragEnd={onDragEnd}
        accessibility={{ screenReaderInstructions: { draggable: 'Drag the card to another column, or use its Move button.' } }}
      >
        <div className="grid gap-3 md:grid-cols-5">
          {props.columns.map((col) => (
            <Column key={col.state} column={col} dragging={dragging}>
              {col.cards.length === 0 ? (
                <p className="px-1 py-3 text-xs text-pencil">Nothing here now.</p>
              ) : (
                <ul className="grid gap-2">
                  {col.cards.map((c) => (
                    <Card key={c.id} card={c} timeZone={props.timeZone} tutorialPath={props.tutorialPath} onMove={ask} busy={move.isPending} />
                  ))}
                </ul>
              )}
            </Column>
          ))}
        </div>
      </DndContext>
      <ConfirmDialog
        open={pending !== null}
        title={pending ? `${TRANSITIONS[pending.action].label}: “${pending.card.title}”?` : ''}
        confirmLabel={pending ? TRANSITIONS[pending.action].label : 'Move'}
        danger
        busy={move.isPending}
        onConfirm={() => pending && run(pending.card, pending.action, note)}
        onCancel={() => setPending(null)}
      >
        {pending?.action === 'sendBack' ? (
          <>
            <label htmlFor="board-note" className="font-medium text-ink">
              Note for the maker (optional)
            </label>
            <textarea
              id="board-note"
              rows={3}
              maxLength={2000}
              value={note}
              onChange={(e) => setNote(e.target.value)}
              className="mt-1 w-full rounded-md border border-field bg-white px-2 py-1.5 text-ink"
            />
          </>
        ) : (
          'Visitors lose the public page and its exports at once; the tutorial goes back to approved.'
        )}
      </ConfirmDialog>
    </div>
  );
}
