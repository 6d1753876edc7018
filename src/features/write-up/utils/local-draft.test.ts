import { describe, expect, it } from 'vitest';
import { giftBoxDoc } from './test-docs';
import { clearLocalDraft, localDraftKey, planStart, readLocalDraft, writeLocalDraft, type StorageLike } from './local-draft';

// A Map standing in for window.localStorage: getItem answers null for a missing key
// (HTML Living Standard, Web Storage, "getItem(key)").
function memoryStorage(): StorageLike & { map: Map<string, string> } {
  const map = new Map<string, string>();
  return { map, getItem: (k) => map.get(k) ?? null, setItem: (k, v) => void map.set(k, v), removeItem: (k) => void map.delete(k) };
}

describe('the copy kept on this device', () => {
  it('round-trips under one key per tutorial and is forgotten on clear', () => {
    const s = memoryStorage();
    const draft = { baseVersion: 4, doc: giftBoxDoc(), editedAt: 1_700_000_000_000 };
    expect(writeLocalDraft(s, 't1', draft)).toBe(true);
    expect(readLocalDraft(s, 't1')).toEqual(draft);
    expect(readLocalDraft(s, 't2')).toBeNull();
    expect([...s.map.keys()]).toEqual([localDraftKey('t1')]);
    clearLocalDraft(s, 't1');
    expect(readLocalDraft(s, 't1')).toBeNull();
  });

  it('treats anything unreadable as nothing kept', () => {
    const s = memoryStorage();
    s.setItem(localDraftKey('t'), '{not json');
    expect(readLocalDraft(s, 't')).toBeNull();
    s.setItem(localDraftKey('t'), JSON.stringify({ baseVersion: 1, editedAt: 1, doc: { type: 'doc', content: [{ type: 'blink' }] } }));
    expect(readLocalDraft(s, 't')).toBeNull();
    s.setItem(localDraftKey('t'), JSON.stringify({ baseVersion: -1, editedAt: 1, doc: giftBoxDoc() }));
    expect(readLocalDraft(s, 't')).toBeNull();
    expect(readLocalDraft(null, 't')).toBeNull();
  });

  it('reports a full storage instead of throwing (setItem throws QuotaExceededError: HTML Living Standard, Web Storage)', () => {
    const full: StorageLike = {
      getItem: () => null,
      removeItem: () => undefined,
      setItem: () => {
        throw new DOMException('full', 'QuotaExceededError');
      },
    };
    expect(writeLocalDraft(full, 't', { baseVersion: 0, doc: giftBoxDoc(), editedAt: 0 })).toBe(false);
  });
});

describe('planStart', () => {
  const server = { doc: giftBoxDoc(), version: 7 };
  const edited = () => {
    const d = giftBoxDoc();
    d.content![1]!.content![0]!.text = 'Edited on the train.';
    return d;
  };

  it('starts from the server when nothing is kept, or what is kept is what the server has', () => {
    expect(planStart(server, null)).toEqual({ kind: 'server' });
    expect(planStart(server, { baseVersion: 3, doc: giftBoxDoc(), editedAt: 1 })).toEqual({ kind: 'server' });
  });

  it('puts kept edits back when they were made on the version the server still has', () => {
    const draft = { baseVersion: 7, doc: edited(), editedAt: 1 };
    expect(planStart(server, draft)).toEqual({ kind: 'restore', draft });
  });

  it('asks the person to compare when someone saved a newer version meanwhile', () => {
    const draft = { baseVersion: 6, doc: edited(), editedAt: 1 };
    expect(planStart(server, draft)).toEqual({ kind: 'compare', draft });
  });
});
