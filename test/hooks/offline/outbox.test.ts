import 'fake-indexeddb/auto';
import { describe, expect, it } from 'vitest';
import { RequestError } from '@/hooks/api/request';
import { Outbox, isRefusal, type NewOutboxEntry } from '@/hooks/offline/outbox';
import { createOutboxStore } from '@/hooks/offline/outbox-store.web';
import type { OutboxEntry } from '@/hooks/offline/outbox-types';

let dbCount = 0;
const freshDb = () => `outbox-test-${(dbCount += 1)}`;

const OWNER = '1:7';
const entry = (key: string, extra: Partial<NewOutboxEntry> = {}): NewOutboxEntry => ({
  key,
  owner: OWNER,
  kind: 'tag-note',
  summary: `note ${key}`,
  method: 'POST',
  path: `/tags/1/notes`,
  body: { text: key },
  tagId: 1,
  ...extra,
});

/** Answers like the server would: each key's scripted answers in turn, then 200. */
function server(script: Record<string, RequestError[]> = {}) {
  const calls: { key: string }[] = [];
  const send = async (e: OutboxEntry) => {
    calls.push({ key: e.key });
    const next = script[e.key]?.shift();
    if (next) throw next;
  };
  return { calls, send };
}

const offline = () => new RequestError(0, 'offline', 'Cannot reach the Isoledger server.');

describe('Outbox', () => {
  it('sends entries oldest first, each with its own key, and empties itself', async () => {
    const box = new Outbox(createOutboxStore(freshDb()));
    for (const k of ['a', 'b', 'c']) await box.add(entry(k));
    const { calls, send } = server();
    const result = await box.flush(OWNER, send);
    expect(calls.map((c) => c.key)).toEqual(['a', 'b', 'c']);
    expect(result).toEqual({ sent: 3, refused: 0, waiting: 0 });
    expect(box.snapshot()).toEqual([]);
  });

  it('keeps one entry when the same key is added twice (a second tap on the same form)', async () => {
    const box = new Outbox(createOutboxStore(freshDb()));
    await box.add(entry('raise-1', { kind: 'raise-tag' }));
    await box.add(entry('raise-1', { kind: 'raise-tag' }));
    expect(box.snapshot().map((e) => e.key)).toEqual(['raise-1']);
  });

  it('stops at no signal, keeps the rest in order and sends them all on the next try', async () => {
    const box = new Outbox(createOutboxStore(freshDb()));
    for (const k of ['a', 'b', 'c']) await box.add(entry(k));
    const { calls, send } = server({ b: [offline()] });
    const first = await box.flush(OWNER, send);
    expect(first).toEqual({ sent: 1, refused: 0, waiting: 2 });
    expect(box.snapshot().map((e) => [e.key, e.state, e.attempts])).toEqual([['b', 'waiting', 1], ['c', 'waiting', 0]]);
    const second = await box.flush(OWNER, send);
    expect(second).toEqual({ sent: 2, refused: 0, waiting: 0 });
    // b was tried twice with the same key, c never overtook it.
    expect(calls.map((c) => c.key)).toEqual(['a', 'b', 'b', 'c']);
  });

  it('keeps an expired session, a timeout, too many requests and a server fault waiting', async () => {
    for (const status of [401, 408, 429, 500, 503]) {
      const err = new RequestError(status, 'server-error', 'later');
      expect(isRefusal(err)).toBe(false);
      const box = new Outbox(createOutboxStore(freshDb()));
      await box.add(entry('a'));
      await box.flush(OWNER, server({ a: [err] }).send);
      expect(box.snapshot()[0].state).toBe('waiting');
    }
  });

  it('keeps a refusal on its entry with the server’s message and goes on with the next entry', async () => {
    const box = new Outbox(createOutboxStore(freshDb()));
    await box.add(entry('clear-1', { kind: 'tag-clear', summary: 'clear the tag (tag 1)' }));
    await box.add(entry('note-2'));
    const refusal = new RequestError(409, 'already-cleared', 'This tag was already cleared by Ama at 10:42.');
    const { calls, send } = server({ 'clear-1': [refusal] });
    const result = await box.flush(OWNER, send);
    expect(result).toEqual({ sent: 1, refused: 1, waiting: 0 });
    expect(calls.map((c) => c.key)).toEqual(['clear-1', 'note-2']);
    const [kept] = box.snapshot();
    expect(kept.key).toBe('clear-1');
    expect(kept.state).toBe('refused');
    expect(kept.refusal).toEqual({ status: 409, code: 'already-cleared', message: 'This tag was already cleared by Ama at 10:42.' });
    // A refused entry is not sent again on its own; only when the person asks.
    await box.flush(OWNER, send);
    expect(calls).toHaveLength(2);
    await box.retry('clear-1');
    await box.flush(OWNER, send);
    expect(calls.map((c) => c.key)).toEqual(['clear-1', 'note-2', 'clear-1']);
    expect(box.snapshot()).toEqual([]);
  });

  it('survives a reload: a new outbox on the same database finds the entries, their order and refusals', async () => {
    const db = freshDb();
    const before = new Outbox(createOutboxStore(db));
    await before.add(entry('a'));
    await before.add(entry('b'));
    await before.add(entry('c'));
    await before.flush(OWNER, server({ a: [new RequestError(409, 'archived', 'The item is archived.')], b: [offline()] }).send);

    const after = new Outbox(createOutboxStore(db));
    await after.load();
    expect(after.snapshot().map((e) => [e.key, e.state])).toEqual([['a', 'refused'], ['b', 'waiting'], ['c', 'waiting']]);
    expect(after.snapshot()[0].refusal?.message).toBe('The item is archived.');
    const { calls, send } = server();
    await after.flush(OWNER, send);
    expect(calls.map((c) => c.key)).toEqual(['b', 'c']);
  });

  it('sends only the signed-in person’s entries; another person’s wait for their own sign-in', async () => {
    const box = new Outbox(createOutboxStore(freshDb()));
    await box.add(entry('mine'));
    await box.add(entry('theirs', { owner: '1:8' }));
    const { calls, send } = server();
    await box.flush(OWNER, send);
    expect(calls.map((c) => c.key)).toEqual(['mine']);
    expect(box.snapshot().map((e) => e.key)).toEqual(['theirs']);
  });

  it('runs one send at a time: a second flush while one runs shares it instead of sending twice', async () => {
    const box = new Outbox(createOutboxStore(freshDb()));
    await box.add(entry('a'));
    const { calls, send } = server();
    await Promise.all([box.flush(OWNER, send), box.flush(OWNER, send)]);
    expect(calls.map((c) => c.key)).toEqual(['a']);
  });
});
