import { MACHINE_UPDATE, SHOP_UPDATE, machineUpdateSchema, shopUpdateSchema, type MachineUpdate, type ShopUpdate } from '../board/schemas';

/*
 * The client side of the live link, shared by the kiosk and the web app. It knows socket.io only
 * by the few members it uses, so it stays free of any client library and runs in tests as is.
 */

export type LinkStatus = 'connecting' | 'connected' | 'reconnecting';

/** A change the server committed. Hints say what to refetch; they never carry what to show. */
export type LiveHint = { type: 'machine'; update: MachineUpdate } | { type: 'shop'; update: ShopUpdate };

/** The part of a socket.io client socket the link uses; socket.io-client's Socket has them all. */
export interface LiveSocket {
  /** False once socket.io has stopped trying by itself: the server refused or closed the link. */
  readonly active: boolean;
  on(event: string, listener: (payload: unknown) => void): unknown;
  connect(): unknown;
  disconnect(): unknown;
}

export interface LiveLinkHandlers {
  status(status: LinkStatus): void;
  hint(hint: LiveHint): void;
  /** Anything shown may be out of date: the link was down (or just came up), or an event was unreadable. */
  resync(): void;
  /** The server turned the link away: the device's pairing or the person's sign-in is gone. */
  refused(): void;
}

/** After a refusal the link asks again at this pace; a refused link is not retried by socket.io. */
export const REFUSED_RETRY_MS = 15_000;

/**
 * Keeps a live link open and turns what arrives into handler calls. Returns the way to close it.
 * socket.io reconnects by itself after a dropped link, with a growing delay; after a refusal in
 * the handshake or a server-side disconnect it does not, so the link asks again itself.
 */
export function watchLiveLink(socket: LiveSocket, handlers: LiveLinkHandlers, retryRefusedMs = REFUSED_RETRY_MS): () => void {
  let retry: ReturnType<typeof setTimeout> | undefined;
  let closed = false;

  const lost = () => {
    handlers.status('reconnecting');
    if (socket.active || closed) return;
    handlers.refused();
    clearTimeout(retry);
    retry = setTimeout(() => socket.connect(), retryRefusedMs);
  };

  socket.on('connect', () => {
    handlers.status('connected');
    // Changes made while the link was down, or between the first fetch and this moment, sent no
    // event to this screen.
    handlers.resync();
  });
  socket.on('disconnect', lost);
  socket.on('connect_error', lost);
  socket.on(MACHINE_UPDATE, (payload) => {
    const parsed = machineUpdateSchema.safeParse(payload);
    if (parsed.success) handlers.hint({ type: 'machine', update: parsed.data });
    else handlers.resync();
  });
  socket.on(SHOP_UPDATE, (payload) => {
    const parsed = shopUpdateSchema.safeParse(payload);
    if (parsed.success) handlers.hint({ type: 'shop', update: parsed.data });
    else handlers.resync();
  });

  handlers.status('connecting');
  socket.connect();

  return () => {
    closed = true;
    clearTimeout(retry);
    socket.disconnect();
  };
}
