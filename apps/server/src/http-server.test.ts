import { describe, expect, it } from 'vitest';
import { listen } from './http-server';

describe('graceful shutdown', () => {
  it('finishes a request in flight and then stops accepting connections', async () => {
    let release!: () => void;
    const gate = new Promise<void>((resolve) => (release = resolve));
    const http = await listen(
      (_req, res) => {
        void gate.then(() => res.end('finished'));
      },
      0,
      '127.0.0.1',
    );
    const url = `http://127.0.0.1:${http.port}/`;
    const inFlight = fetch(url).then((r) => r.text());
    await new Promise((resolve) => setTimeout(resolve, 100));

    const stopped = http.shutdown();
    await new Promise((resolve) => setTimeout(resolve, 50));
    await expect(fetch(url)).rejects.toThrow();

    release();
    expect(await inFlight).toBe('finished');
    await stopped;
    expect(http.server.listening).toBe(false);
  });
});
