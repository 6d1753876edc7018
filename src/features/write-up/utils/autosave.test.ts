import type { JSONContent } from '@tiptap/core';
import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import { ApiError } from '@/lib/api-client';
import { Autosave, type AutosaveOptions } from './autosave';
import { localDraftKey, readLocalDraft, type StorageLike } from './local-draft';
import { giftBoxDoc } from './test-docs';

function memoryStorage(): StorageLike {
  const map = new Map<string, string>();
  return { getItem: (k) => map.get(k) ?? null, setItem: (k, v) => void map.set(k, v), removeItem: (k) => void map.delete(k) };
}

type Put = { doc: JSONContent; version: number; resolve: (v: { version: number; updatedAt: string }) => void; reject: (e: unknown) => void };

/** An editor stand-in whose text changes with each edit, and a server whose answers the test gives. */
function setup(over: Partial<AutosaveOptions> = {}) {
  let n = 0;
  const doc = () => {
    const d = giftBoxDoc();
    d.content![1]!.content![0]!.text = `Edit number ${n}`;
    return d;
  };
  const puts: Put[] = [];
  const storage = memoryStorage();
  const a = new Autosave({
    tutorialId: 'tut',
    version: 3,
    getDoc: doc,
    put: (d, version) => new Promise((resolve, reject) => puts.push({ doc: d, version, resolve, reject })),
    storage,
    delayMs: 1000,
    localDelayMs: 250,
    retryMs: 15_000,
    ...over,
  });
  const edit = () => {
    n++;
    a.changed();
  };
  return { a, puts, storage, edit, kept: () => readLocalDraft(storage, 'tut') };
}

// A 409 as the server sends it (server/services/write-up.ts; RFC 9110 §15.5.10: the request
// conflicts with the current state of the resource).
const stale = (version: number, doc: JSONContent) =>
  new ApiError(409, `Someone saved a newer version (${version})`, [], {
    code: 'stale',
    version,
    doc,
    updatedBy: { id: 'u2', name: 'Ada Quill' },
    updatedAt: '2026-03-02T12:04:00.000Z',
  });

beforeEach(() => vi.useFakeTimers());
afterEach(() => vi.useRealTimers());

describe('Autosave', () => {
  it('saves once, a second after typing stops, with the version the edits are based on', async () => {
    const { a, puts, edit, kept } = setup();
    edit();
    await vi.advanceTimersByTimeAsync(600);
    edit();
    await vi.advanceTimersByTimeAsync(600);
    edit();
    expect(a.getStatus().kind).toBe('pending');
    // On the device already, before any save.
    expect(kept()?.baseVersion).toBe(3);
    await vi.advanceTimersByTimeAsync(999);
    expect(puts).toHaveLength(0);
    await vi.advanceTimersByTimeAsync(1);
    expect(puts).toHaveLength(1);
    expect(puts[0]!.version).toBe(3);
    expect(a.getStatus().kind).toBe('saving');
    puts[0]!.resolve({ version: 4, updatedAt: '2026-03-02T12:03:00.000Z' });
    await vi.advanceTimersByTimeAsync(0);
    expect(a.getStatus()).toEqual({ kind: 'saved', at: new Date('2026-03-02T12:03:00.000Z') });
    expect(a.baseVersion).toBe(4);
    expect(a.dirty).toBe(false);
    // The server has it: the device copy is gone.
    expect(kept()).toBeNull();
  });

  it('never sends two saves at once: edits made while saving go next, with the version the first one returned', async () => {
    const { a, puts, edit, kept } = setup();
    edit();
    await vi.advanceTimersByTimeAsync(1000);
    edit();
    await vi.advanceTimersByTimeAsync(5000);
    expect(puts).toHaveLength(1);
    puts[0]!.resolve({ version: 4, updatedAt: '2026-03-02T12:03:00.000Z' });
    await vi.advanceTimersByTimeAsync(0);
    // Still unsaved, and now kept as based on version 4.
    expect(kept()?.baseVersion).toBe(4);
    expect(puts).toHaveLength(2);
    expect(puts[1]!.version).toBe(4);
    expect(puts[1]!.doc.content![1]!.content![0]!.text).toBe('Edit number 2');
    puts[1]!.resolve({ version: 5, updatedAt: '2026-03-02T12:03:05.000Z' });
    await vi.advanceTimersByTimeAsync(0);
    expect(a.dirty).toBe(false);
    expect(kept()).toBeNull();
  });

  it('offline: says so, keeps the edits on the device, and saves them when the browser is back online', async () => {
    let online = true;
    const { a, puts, edit, kept } = setup({ isOnline: () => online });
    edit();
    await vi.advanceTimersByTimeAsync(1000);
    // A dropped connection: fetch rejects and api() turns it into ApiError status 0.
    puts[0]!.reject(new ApiError(0, 'Cannot reach the server'));
    await vi.advanceTimersByTimeAsync(0);
    expect(a.getStatus().kind).toBe('offline');
    expect(kept()?.doc.content![1]!.content![0]!.text).toBe('Edit number 1');

    // While navigator.onLine is false nothing is sent (HTML Living Standard, "navigator.onLine").
    online = false;
    edit();
    await vi.advanceTimersByTimeAsync(20_000);
    expect(puts).toHaveLength(1);
    expect(a.getStatus().kind).toBe('offline');
    expect(kept()?.doc.content![1]!.content![0]!.text).toBe('Edit number 2');

    // The 'online' event.
    online = true;
    a.retry();
    expect(puts).toHaveLength(2);
    expect(puts[1]!.version).toBe(3);
    puts[1]!.resolve({ version: 4, updatedAt: '2026-03-02T12:10:00.000Z' });
    await vi.advanceTimersByTimeAsync(0);
    expect(a.getStatus().kind).toBe('saved');
    expect(kept()).toBeNull();
  });

  it('a failing server is retried on its own; a refused document waits for the next edit', async () => {
    const { a, puts, edit } = setup();
    edit();
    await vi.advanceTimersByTimeAsync(1000);
    puts[0]!.reject(new ApiError(503, 'Service Unavailable'));
    await vi.advanceTimersByTimeAsync(0);
    expect(a.getStatus()).toEqual({ kind: 'error', message: 'the server had a problem (Service Unavailable). Trying again shortly' });
    await vi.advanceTimersByTimeAsync(15_000);
    expect(puts).toHaveLength(2);
    puts[1]!.reject(new ApiError(400, 'doc: /content/2: unknown node type "blink"'));
    await vi.advanceTimersByTimeAsync(60_000);
    expect(puts).toHaveLength(2);
    expect(a.getStatus()).toEqual({ kind: 'error', message: 'doc: /content/2: unknown node type "blink"' });
    edit();
    await vi.advanceTimersByTimeAsync(1000);
    expect(puts).toHaveLength(3);
  });

  it('a stale save stops autosaving and hands over the newer version; "keep mine" saves over it knowingly', async () => {
    const { a, puts, edit, kept } = setup();
    edit();
    await vi.advanceTimersByTimeAsync(1000);
    const theirs = giftBoxDoc();
    theirs.content![0]!.content![0]!.text = 'Round gift box (their title)';
    puts[0]!.reject(stale(5, theirs));
    await vi.advanceTimersByTimeAsync(0);
    const status = a.getStatus();
    expect(status.kind).toBe('conflict');
    if (status.kind === 'conflict') expect(status.theirs).toMatchObject({ version: 5, updatedBy: { name: 'Ada Quill' }, doc: theirs });
    // Typing on while the person decides: kept on the device (still based on 3), not sent.
    edit();
    await vi.advanceTimersByTimeAsync(10_000);
    expect(puts).toHaveLength(1);
    expect(kept()?.baseVersion).toBe(3);
    expect(kept()?.doc.content![1]!.content![0]!.text).toBe('Edit number 2');

    const done = a.keepMine();
    expect(puts[1]!.version).toBe(5);
    puts[1]!.resolve({ version: 6, updatedAt: '2026-03-02T12:05:00.000Z' });
    expect(await done).toBe(true);
    expect(a.baseVersion).toBe(6);
    expect(kept()).toBeNull();
  });

  it('"take theirs" makes the newer version the base and forgets the device copy', async () => {
    const { a, puts, edit, kept } = setup();
    edit();
    await vi.advanceTimersByTimeAsync(1000);
    puts[0]!.reject(stale(5, giftBoxDoc()));
    await vi.advanceTimersByTimeAsync(0);
    expect(kept()).not.toBeNull();
    a.acceptTheirs();
    expect(a.baseVersion).toBe(5);
    expect(a.dirty).toBe(false);
    expect(a.getStatus()).toEqual({ kind: 'saved', at: new Date('2026-03-02T12:04:00.000Z') });
    expect(kept()).toBeNull();
  });

  it('a 409 whose newer version is exactly this one (a second tab saved it) is no conflict', async () => {
    const { a, puts, edit } = setup();
    edit();
    await vi.advanceTimersByTimeAsync(1000);
    puts[0]!.reject(stale(4, puts[0]!.doc));
    await vi.advanceTimersByTimeAsync(0);
    expect(a.getStatus().kind).toBe('saved');
    expect(a.baseVersion).toBe(4);
  });

  it('flush() waits for the running save and sends what is left; stop() keeps the edits and sends a last save', async () => {
    const { a, puts, edit, storage } = setup();
    edit();
    await vi.advanceTimersByTimeAsync(1000);
    edit();
    const flushed = a.flush();
    puts[0]!.resolve({ version: 4, updatedAt: '2026-03-02T12:03:00.000Z' });
    await vi.advanceTimersByTimeAsync(0);
    expect(puts).toHaveLength(2);
    puts[1]!.resolve({ version: 5, updatedAt: '2026-03-02T12:03:01.000Z' });
    expect(await flushed).toBe(true);

    edit();
    a.stop();
    // Written at once, not after the 250 ms pause: the page may be gone by then.
    expect(storage.getItem(localDraftKey('tut'))).not.toBeNull();
    expect(puts).toHaveLength(3);
    expect(puts[2]!.version).toBe(5);
  });
});
