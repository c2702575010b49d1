import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import { watchLiveLink, type LinkStatus, type LiveHint, type LiveSocket } from './link';

/** Stands in for a socket.io client socket: the test plays the server's part. */
class FakeSocket implements LiveSocket {
  active = false;
  connects = 0;
  disconnects = 0;
  private listeners = new Map<string, ((payload: unknown) => void)[]>();

  on(event: string, listener: (payload: unknown) => void) {
    this.listeners.set(event, [...(this.listeners.get(event) ?? []), listener]);
    return this;
  }

  connect() {
    this.connects += 1;
    this.active = true;
    return this;
  }

  disconnect() {
    this.disconnects += 1;
    this.active = false;
    return this;
  }

  emit(event: string, payload?: unknown) {
    for (const listener of this.listeners.get(event) ?? []) listener(payload);
  }
}

function watch(socket: FakeSocket) {
  const seen = { statuses: [] as LinkStatus[], hints: [] as LiveHint[], resyncs: 0, refusals: 0 };
  const close = watchLiveLink(socket, {
    status: (status) => seen.statuses.push(status),
    hint: (hint) => seen.hints.push(hint),
    resync: () => (seen.resyncs += 1),
    refused: () => (seen.refusals += 1),
  });
  return { seen, close };
}

const machineId = '6f1d2c9e-3b7a-4e0f-9a51-2d8c4b6e7f10';

describe('live link', () => {
  beforeEach(() => {
    vi.useFakeTimers();
  });
  afterEach(() => {
    vi.useRealTimers();
  });

  it('connects at once and says so, then refetches everything once connected', () => {
    const socket = new FakeSocket();
    const { seen } = watch(socket);

    expect(socket.connects).toBe(1);
    expect(seen.statuses).toEqual(['connecting']);

    socket.emit('connect');

    expect(seen.statuses).toEqual(['connecting', 'connected']);
    expect(seen.resyncs).toBe(1);
  });

  it('shows reconnecting when the link drops and refetches everything when it is back', () => {
    const socket = new FakeSocket();
    const { seen } = watch(socket);
    socket.emit('connect');

    // socket.io keeps trying by itself after a dropped transport: the socket stays active.
    socket.emit('disconnect', 'transport close');
    socket.emit('connect_error', new Error('websocket error'));

    expect(seen.statuses.at(-1)).toBe('reconnecting');
    expect(seen.refusals).toBe(0);

    socket.emit('connect');

    expect(seen.statuses.at(-1)).toBe('connected');
    expect(seen.resyncs).toBe(2);
  });

  it('passes on machine and shop changes as hints', () => {
    const socket = new FakeSocket();
    const { seen } = watch(socket);
    socket.emit('connect');

    socket.emit('machine:update', { machineId, state: 'in_use', at: '2027-03-05T21:42:07.120Z' });
    socket.emit('shop:update', { kind: 'duty', at: '2027-03-05T21:43:00.000Z' });

    expect(seen.hints).toEqual([
      { type: 'machine', update: { machineId, state: 'in_use', at: '2027-03-05T21:42:07.120Z' } },
      { type: 'shop', update: { kind: 'duty', at: '2027-03-05T21:43:00.000Z' } },
    ]);
  });

  it('refetches everything when an event cannot be read, rather than miss a change', () => {
    const socket = new FakeSocket();
    const { seen } = watch(socket);
    socket.emit('connect');

    socket.emit('machine:update', { machineId, state: 'broken', at: 'yesterday' });

    expect(seen.hints).toEqual([]);
    expect(seen.resyncs).toBe(2);
  });

  it('after the server refuses the handshake, reports it and asks again later', () => {
    const socket = new FakeSocket();
    const { seen } = watch(socket);

    // A refusal in the server's handshake leaves the socket inactive: socket.io does not retry it.
    socket.active = false;
    socket.emit('connect_error', new Error('unauthorized'));

    expect(seen.refusals).toBe(1);
    expect(seen.statuses.at(-1)).toBe('reconnecting');
    expect(socket.connects).toBe(1);

    vi.advanceTimersByTime(15_000);

    expect(socket.connects).toBe(2);
  });

  it('closing stops the link and any retry', () => {
    const socket = new FakeSocket();
    const { seen, close } = watch(socket);
    socket.active = false;
    socket.emit('connect_error', new Error('unauthorized'));

    close();
    socket.emit('disconnect', 'io client disconnect');
    vi.advanceTimersByTime(60_000);

    expect(socket.disconnects).toBe(1);
    expect(socket.connects).toBe(1);
    expect(seen.refusals).toBe(1);
  });
});
