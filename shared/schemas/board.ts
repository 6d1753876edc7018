import { z } from 'zod';
import type { DueStatus } from '../board/dates';
import { isoWithOffset, timeZoneSchema } from './class';
import { monthSchema } from './brief';
import { uuidSchema } from './studio';
import type { PersonDto, Transition, TutorialState } from './tutorial';

/**
 * GET /studios/:id/board. `month` narrows the cards to tutorials due, published or scheduled in
 * it and picks the calendar's month (the current one by default); `timeZone` is the viewer's,
 * so "today", the calendar's days and the counts are theirs.
 */
export const boardQuery = z.object({
  month: monthSchema.optional(),
  makerId: uuidSchema.optional(),
  timeZone: timeZoneSchema.default('UTC'),
});

/** PUT /tutorials/:id/schedule: when an approved tutorial goes out, and the zone the time was picked in. */
export const schedulePublishSchema = z.object({
  at: isoWithOffset,
  timeZone: timeZoneSchema,
});
export type SchedulePublishInput = z.input<typeof schedulePublishSchema>;

// Response shapes (DTOs)

/** One tutorial on the board. `moves` are the review moves the caller may make now (the policy decides). */
export type BoardCardDto = {
  id: string;
  title: string;
  state: TutorialState;
  maker: PersonDto | null;
  dueDate: string | null;
  due: DueStatus | null;
  /**
   * When it last changed (its record, write-up, cut list, supplies or a review move), and its
   * last review move in words ("moved to approved") with who made it; both null before any move.
   */
  lastChange: { at: string; by: string | null; what: string | null };
  openComments: number;
  publishedAt: string | null;
  publishAt: string | null;
  publishTimeZone: string | null;
  briefId: string | null;
  moves: Transition[];
};

export type BoardColumnDto = { state: TutorialState; label: string; cards: BoardCardDto[] };

/** A maker's month against their target: published and scheduled in the month, and due in it. */
export type BoardMakerDto = { id: string; name: string; target: number | null; published: number; scheduled: number; due: number };

/** A day's entry on the month calendar. Publish entries are placed on the viewer's day. */
export type CalendarEntryDto = {
  day: string;
  kind: 'due' | 'brief' | 'published' | 'scheduled';
  title: string;
  tutorialId: string | null;
  briefId: string | null;
  /** The publish time (published and scheduled entries). */
  at: string | null;
};

export type BoardDto = {
  month: string;
  today: string;
  timeZone: string;
  filtered: boolean;
  columns: BoardColumnDto[];
  makers: BoardMakerDto[];
  calendar: CalendarEntryDto[];
  abilities: { createBrief: boolean; setTargets: boolean };
};
