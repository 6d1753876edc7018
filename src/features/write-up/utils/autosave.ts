import type { JSONContent } from '@tiptap/core';
import { ApiError } from '@/lib/api-client';
import { newerArticleOf } from '../api/save-article';
import type { NewerArticleDto, SavedArticleDto } from '@shared/schemas/article';
import { clearLocalDraft, writeLocalDraft, type StorageLike } from './local-draft';
import { isRetryable, saveErrorMessage } from './save-errors';
import { sameDoc } from './same-doc';

/** Where the write-up stands with the server. */
export type SaveStatus =
  | { kind: 'idle' }
  | { kind: 'pending' }
  | { kind: 'saving' }
  | { kind: 'saved'; at: Date }
  | { kind: 'offline' }
  | { kind: 'error'; message: string }
  | { kind: 'conflict'; theirs: NewerArticleDto };

export interface AutosaveOptions {
  tutorialId: string;
  /** The server version the editor's content starts from. */
  version: number;
  /** The editor's current document. */
  getDoc: () => JSONContent;
  put: (doc: JSONContent, version: number) => Promise<SavedArticleDto>;
  storage?: StorageLike | null;
  isOnline?: () => boolean;
  /** Called after each save the server accepted (the page updates its cache). */
  onSaved?: (doc: JSONContent, saved: SavedArticleDto) => void;
  /** The pause after the last edit before saving. */
  delayMs?: number;
  /** The pause before the edits are written to this device (a burst of typing is written once). */
  localDelayMs?: number;
  /** How long to wait before trying again after a lost connection or a server failure. */
  retryMs?: number;
  now?: () => number;
}

type Timer = ReturnType<typeof setTimeout>;

/**
 * The write-up's autosave, apart from React so it can be tested with fake timers:
 *
 * - every edit is written to this device (localStorage) within `localDelayMs`, and stays there
 *   until the server has it, so a reload or a dropped connection loses nothing;
 * - `delayMs` after typing stops, the document is PUT with the version it is based on; edits made
 *   while a save is under way are saved next, never in parallel (each save needs the version the
 *   previous one returned);
 * - offline or a failing server: the status says so and it tries again (`retry()` on the
 *   browser's 'online' event, and every `retryMs`);
 * - a 409 stops autosaving and hands the newer write-up over for the person to choose
 *   (`keepMine`, `acceptTheirs`); while they choose, edits are still kept on the device.
 */
export class Autosave {
  private status: SaveStatus;
  private readonly listeners = new Set<() => void>();
  private version: number;
  private seq = 0;
  private savedSeq = 0;
  private inFlight: Promise<boolean> | null = null;
  private saveTimer: Timer | null = null;
  private localTimer: Timer | null = null;
  private retryTimer: Timer | null = null;
  private localFailed = false;
  private stopped = false;

  constructor(private readonly o: AutosaveOptions) {
    this.version = o.version;
    this.status = { kind: 'idle' };
  }

  /** The server version the editor's content is based on (what the next save sends). */
  get baseVersion(): number {
    return this.version;
  }

  /** True while some edit is not on the server. */
  get dirty(): boolean {
    return this.seq !== this.savedSeq;
  }

  /** True when the last attempt to keep edits on this device failed (storage full or turned off). */
  get deviceCopyFailed(): boolean {
    return this.localFailed;
  }

  getStatus = (): SaveStatus => this.status;

  subscribe = (fn: () => void): (() => void) => {
    this.listeners.add(fn);
    return () => this.listeners.delete(fn);
  };

  /** Sets what the status says without saving (e.g. "Saved 12:03" for the version just loaded). */
  setStatus(status: SaveStatus): void {
    this.status = status;
    for (const fn of this.listeners) fn();
  }

  /** Called after each edit of the document. */
  changed(): void {
    this.seq++;
    this.scheduleLocal();
    if (this.status.kind === 'conflict') return;
    if (this.status.kind !== 'saving' && this.status.kind !== 'offline') this.setStatus({ kind: 'pending' });
    this.scheduleSave(this.o.delayMs ?? 1000);
  }

  /** Saves now if anything is unsaved; resolves true once the server has every edit. */
  async flush(): Promise<boolean> {
    this.clear('saveTimer');
    for (;;) {
      if (this.inFlight) {
        await this.inFlight;
        continue;
      }
      if (!this.dirty) return true;
      if (this.status.kind === 'conflict' || !(await this.save())) return false;
    }
  }

  /** Tries again now (the browser is back online). */
  retry(): void {
    if (this.dirty && (this.status.kind === 'offline' || this.status.kind === 'error')) void this.save();
  }

  /** Conflict: saves this device's version over the newer one, knowingly. */
  keepMine(): Promise<boolean> {
    if (this.status.kind !== 'conflict') return Promise.resolve(false);
    return this.save(this.status.theirs.version);
  }

  /**
   * Conflict: the editor now shows the newer version (the caller has put it in without an update
   * event), so it is what the server has.
   */
  acceptTheirs(): void {
    if (this.status.kind !== 'conflict') return;
    const { theirs } = this.status;
    this.baseChanged(theirs.version, theirs.updatedAt ? new Date(theirs.updatedAt) : new Date(this.now()));
  }

  /** The server's write-up was replaced by another route (draft, restore, import) and the editor shows it. */
  baseChanged(version: number, at: Date = new Date(this.now())): void {
    this.version = version;
    this.savedSeq = this.seq;
    this.clear('saveTimer');
    this.clear('localTimer');
    clearLocalDraft(this.o.storage ?? null, this.o.tutorialId);
    this.setStatus({ kind: 'saved', at });
  }

  /** Resumes after `stop()` (React runs effects twice in development). */
  start(): void {
    this.stopped = false;
  }

  /**
   * Leaving the page: the edits are written to this device at once and a last save is sent; its
   * answer still clears the device copy when it succeeds.
   */
  stop(): void {
    this.writeLocalNow();
    this.clear('saveTimer');
    this.clear('retryTimer');
    if (this.dirty && this.status.kind !== 'conflict' && !this.inFlight) void this.save();
    this.stopped = true;
  }

  /** Writes pending edits to this device now (the page is being hidden or unloaded). */
  writeLocalNow(): void {
    if (!this.localTimer) return;
    this.clear('localTimer');
    this.writeLocal();
  }

  private now(): number {
    return this.o.now?.() ?? Date.now();
  }

  private clear(name: 'saveTimer' | 'localTimer' | 'retryTimer') {
    const t = this[name];
    if (t) clearTimeout(t);
    this[name] = null;
  }

  private scheduleSave(ms: number) {
    this.clear('saveTimer');
    this.saveTimer = setTimeout(() => {
      this.saveTimer = null;
      void this.save();
    }, ms);
  }

  private scheduleRetry() {
    this.clear('retryTimer');
    if (this.stopped) return;
    this.retryTimer = setTimeout(() => {
      this.retryTimer = null;
      this.retry();
    }, this.o.retryMs ?? 15_000);
  }

  private scheduleLocal() {
    if (this.localTimer) return;
    this.localTimer = setTimeout(() => {
      this.localTimer = null;
      this.writeLocal();
    }, this.o.localDelayMs ?? 250);
  }

  private writeLocal() {
    if (!this.dirty) return;
    this.localFailed = !writeLocalDraft(this.o.storage ?? null, this.o.tutorialId, { baseVersion: this.version, doc: this.o.getDoc(), editedAt: this.now() });
  }

  /** One PUT; `version` overrides the base version (keeping mine over a newer one). */
  private save(version?: number): Promise<boolean> {
    if (this.inFlight) {
      // The answer to the running save gives the version the next one needs; it reschedules.
      return this.inFlight.then(() => (version === undefined ? !this.dirty : this.save(version)));
    }
    if (version === undefined && (!this.dirty || this.status.kind === 'conflict')) return Promise.resolve(!this.dirty);
    if (this.o.isOnline && !this.o.isOnline()) {
      this.writeLocalNow();
      this.setStatus({ kind: 'offline' });
      this.scheduleRetry();
      return Promise.resolve(false);
    }
    this.inFlight = this.send(version ?? this.version).finally(() => {
      this.inFlight = null;
    });
    return this.inFlight;
  }

  private async send(version: number): Promise<boolean> {
    const sentSeq = this.seq;
    const doc = this.o.getDoc();
    this.clear('retryTimer');
    this.setStatus({ kind: 'saving' });
    try {
      const saved = await this.o.put(doc, version);
      this.accepted(saved.version, sentSeq, new Date(saved.updatedAt));
      this.o.onSaved?.(doc, saved);
    } catch (err) {
      const theirs = newerArticleOf(err);
      if (theirs && sameDoc(theirs.doc, doc)) {
        // The server already holds exactly this (a save from another tab or a retried request).
        this.accepted(theirs.version, sentSeq, theirs.updatedAt ? new Date(theirs.updatedAt) : new Date(this.now()));
      } else if (theirs) {
        this.writeLocalNow();
        this.setStatus({ kind: 'conflict', theirs });
        return false;
      } else {
        this.writeLocalNow();
        this.setStatus(err instanceof ApiError && err.status === 0 ? { kind: 'offline' } : { kind: 'error', message: saveErrorMessage(err) });
        if (isRetryable(err)) this.scheduleRetry();
        return false;
      }
    }
    return !this.dirty;
  }

  private accepted(version: number, sentSeq: number, at: Date) {
    this.version = version;
    this.savedSeq = sentSeq;
    if (this.dirty) {
      // Typed while saving: the device copy is now based on the new version, and saved next.
      if (this.localTimer) this.writeLocalNow();
      else this.writeLocal();
      this.setStatus({ kind: 'pending' });
      if (!this.stopped) this.scheduleSave(0);
      return;
    }
    this.clear('localTimer');
    clearLocalDraft(this.o.storage ?? null, this.o.tutorialId);
    this.setStatus({ kind: 'saved', at });
  }
}
