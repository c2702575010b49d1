import { LIVE_PATH, type LiveSocket } from '@chuckkey/core';
import { io } from 'socket.io-client';

/**
 * The live link to this page's own origin; the web session's cookie goes with the handshake.
 * WebSocket only (RFC 6455): the whole link is one connection to one server process, so several
 * processes behind a load balancer need no sticky sessions, which socket.io's HTTP long-polling would.
 */
export function createLiveSocket(): LiveSocket {
  return io({ path: LIVE_PATH, transports: ['websocket'], autoConnect: false });
}
