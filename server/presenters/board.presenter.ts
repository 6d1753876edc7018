import type { BoardCardDto, BoardDto, BoardMakerDto, CalendarEntryDto } from '@shared/schemas/board';
import { STATE_LABELS, TUTORIAL_STATES } from '@shared/schemas/tutorial';
import { dayIn, dueStatus, monthOf } from '@shared/board/dates';
import type { Board } from '../services/board';
import type { StudioAbilities } from '../policies';

type Row = Board['tutorials'][number];

function card(r: Row, today: string): BoardCardDto {
  const t = r.tutorial;
  return {
    id: t.id,
    title: t.title,
    state: t.state,
    maker: t.author ? { id: t.author.id, name: t.author.name } : null,
    dueDate: t.dueDate,
    due: dueStatus(t.dueDate, today, t.state === 'published'),
    lastChange: {
      at: new Date(Math.max(r.lastChange.getTime(), r.lastMove?.at.getTime() ?? 0)).toISOString(),
      by: r.lastMove?.by ?? null,
      what: r.lastMove ? `moved to ${STATE_LABELS[r.lastMove.toState]}` : null,
    },
    openComments: r.openComments,
    publishedAt: t.publishedAt?.toISOString() ?? null,
    publishAt: t.state === 'approved' ? (t.publishAt?.toISOString() ?? null) : null,
    publishTimeZone: t.state === 'approved' ? (t.publishTimeZone ?? null) : null,
    briefId: t.briefId ?? null,
    moves: r.moves,
  };
}

/** Soonest due first, undated last, then by title: what needs attention reads first. */
const byDue = (a: BoardCardDto, b: BoardCardDto) => (a.dueDate ?? '9999-12-31').localeCompare(b.dueDate ?? '9999-12-31') || a.title.localeCompare(b.title);

/** The board: one column a state, the month's calendar and each maker's month against their target. */
export function presentBoard(board: Board, abilities: StudioAbilities): BoardDto {
  const { month, today, timeZone: tz } = board;
  const cards = board.tutorials.map((r) => card(r, today));
  const columns = TUTORIAL_STATES.map((state) => ({ state, label: STATE_LABELS[state], cards: cards.filter((c) => c.state === state).sort(byDue) }));

  const calendar: CalendarEntryDto[] = [];
  const entry = (e: Omit<CalendarEntryDto, 'briefId' | 'tutorialId' | 'at'> & Partial<CalendarEntryDto>) =>
    calendar.push({ tutorialId: null, briefId: null, at: null, ...e });
  for (const c of cards) {
    if (c.dueDate && monthOf(c.dueDate) === month) entry({ day: c.dueDate, kind: 'due', title: c.title, tutorialId: c.id });
    if (c.state === 'published' && c.publishedAt && monthOf(dayIn(c.publishedAt, tz)) === month)
      entry({ day: dayIn(c.publishedAt, tz), kind: 'published', title: c.title, tutorialId: c.id, at: c.publishedAt });
    if (c.publishAt && monthOf(dayIn(c.publishAt, tz)) === month)
      entry({ day: dayIn(c.publishAt, tz), kind: 'scheduled', title: c.title, tutorialId: c.id, at: c.publishAt });
  }
  for (const b of board.briefs) if (monthOf(b.dueDate) === month) entry({ day: b.dueDate, kind: 'brief', title: b.title, briefId: b.id });
  calendar.sort((a, b) => a.day.localeCompare(b.day) || a.kind.localeCompare(b.kind) || a.title.localeCompare(b.title));

  const makers: BoardMakerDto[] = board.makers.map(({ user, target }) => {
    const mine = cards.filter((c) => c.maker?.id === user.id);
    return {
      id: user.id,
      name: user.name,
      target,
      published: mine.filter((c) => c.state === 'published' && c.publishedAt && monthOf(dayIn(c.publishedAt, tz)) === month).length,
      scheduled: mine.filter((c) => c.publishAt && monthOf(dayIn(c.publishAt, tz)) === month).length,
      due:
        mine.filter((c) => c.dueDate && monthOf(c.dueDate) === month).length +
        board.briefs.filter((b) => b.makerId === user.id && monthOf(b.dueDate) === month).length,
    };
  });

  return {
    month,
    today,
    timeZone: tz,
    filtered: board.filtered,
    columns,
    makers,
    calendar,
    abilities: { createBrief: abilities.createBrief, setTargets: abilities.setTargets },
  };
}
