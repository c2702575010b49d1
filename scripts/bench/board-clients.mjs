// The board benchmark's listeners, in a process of their own so that receiving does not share
// an event loop with the server or with the process making the changes. Opens N socket.io
// clients as a paired board device would, records for every `machine:update` the time from the
// change's commit (`at`, stamped by the server) to its receipt, and reports to the parent.
import { io } from 'socket.io-client';

const { BASE_URL, DEVICE_COOKIE, CLIENTS } = process.env;
const count = Number(CLIENTS);
const sockets = [];
let latencies = [];
let received = 0;
const seen = new Map();

function connect() {
  return new Promise((resolve, reject) => {
    const socket = io(BASE_URL, {
      path: '/api/live',
      transports: ['websocket'],
      extraHeaders: { cookie: DEVICE_COOKIE },
      reconnection: false,
    });
    socket.on('machine:update', (event) => {
      latencies.push(Date.now() - Date.parse(event.at));
      received += 1;
      const key = `${event.machineId} ${event.at} ${event.state}`;
      seen.set(key, (seen.get(key) ?? 0) + 1);
    });
    socket.once('connect', () => resolve(socket));
    socket.once('connect_error', reject);
  });
}

process.on('message', async (message) => {
  if (message.type === 'connect') {
    // A few at a time, as a room of boards coming up would: a thousand handshakes at once would
    // measure the handshake, not the updates.
    for (let i = 0; i < count; i += 50) {
      const batch = await Promise.all(Array.from({ length: Math.min(50, count - i) }, connect));
      sockets.push(...batch);
    }
    process.send({ type: 'connected', clients: sockets.length });
  } else if (message.type === 'reset') {
    latencies = [];
    received = 0;
    seen.clear();
    process.send({ type: 'reset' });
  } else if (message.type === 'report') {
    const sorted = Float64Array.from(latencies).sort();
    const at = (p) => (sorted.length ? sorted[Math.min(sorted.length - 1, Math.ceil((p / 100) * sorted.length) - 1)] : NaN);
    // Every distinct change should have reached every client exactly once.
    const short = [...seen.values()].filter((n) => n !== sockets.length).length;
    process.send({ type: 'report', received, distinct: seen.size, short, p50: at(50), p99: at(99), max: sorted[sorted.length - 1] ?? NaN });
  } else if (message.type === 'close') {
    for (const socket of sockets) socket.close();
    process.exit(0);
  }
});
