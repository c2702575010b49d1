// A lean HTTP/1.1 keep-alive client for load generation: one request at a time per connection,
// written straight to a socket, the answer read by Content-Length. On a small machine shared with
// the server and PostgreSQL, a general-purpose client spends more CPU than the route it measures;
// this one leaves that CPU to the server. It speaks only what the benchmark needs (RFC 9112:
// status line, headers, Content-Length bodies), not chunked bodies or redirects.
import net from 'node:net';

const HEADER_END = Buffer.from('\r\n\r\n');

export function leanConnection(host, port) {
  const socket = net.connect({ host, port, noDelay: true });
  let buffered = Buffer.alloc(0);
  let waiting = null;
  let failure = null;

  function settle() {
    if (!waiting) return;
    const headerEnd = buffered.indexOf(HEADER_END);
    if (headerEnd < 0) return;
    const head = buffered.subarray(0, headerEnd).toString('latin1');
    const status = Number(head.slice(9, 12));
    const match = /\r\ncontent-length:\s*(\d+)/i.exec(head);
    if (!match) {
      fail(new Error(`an answer without Content-Length (status ${status})`));
      return;
    }
    const end = headerEnd + 4 + Number(match[1]);
    if (buffered.length < end) return;
    const body = buffered.subarray(headerEnd + 4, end);
    buffered = buffered.subarray(end);
    const { resolve } = waiting;
    waiting = null;
    resolve({ status, body });
  }

  function fail(error) {
    failure = error;
    if (waiting) {
      const { reject } = waiting;
      waiting = null;
      reject(error);
    }
  }

  socket.on('data', (chunk) => {
    buffered = buffered.length ? Buffer.concat([buffered, chunk]) : chunk;
    settle();
  });
  socket.on('error', fail);
  socket.on('close', () => fail(failure ?? new Error('the server closed the connection')));
  const ready = new Promise((resolve, reject) => {
    socket.once('connect', resolve);
    socket.once('error', reject);
  });

  return {
    async post(path, headers, body) {
      await ready;
      if (failure) throw failure;
      const payload = Buffer.from(body);
      const lines = [`POST ${path} HTTP/1.1`, `host: ${host}:${port}`, 'connection: keep-alive', `content-length: ${payload.length}`];
      for (const [name, value] of Object.entries(headers)) lines.push(`${name}: ${value}`);
      return new Promise((resolve, reject) => {
        waiting = { resolve, reject };
        socket.write(Buffer.concat([Buffer.from(lines.join('\r\n') + '\r\n\r\n', 'latin1'), payload]));
      });
    },
    close() {
      socket.destroy();
    },
  };
}
