import type { IncomingMessage, Server as HttpServer } from 'node:http';
import { createAdapter } from '@socket.io/postgres-adapter';
import type { RequestHandler } from 'express';
import type { Passport } from 'passport';
import pg from 'pg';
import { Server, type Socket } from 'socket.io';
import {
  LIVE_JOIN,
  LIVE_PATH,
  MACHINE_UPDATE,
  SHOP_UPDATE,
  STATION_COOKIE,
  liveJoinSchema,
  type MachineUpdate,
  type Role,
  type ShopUpdate,
} from '@chuckkey/core';
import type { Config } from '../config';
import type { Db } from '../lib/db';
import type { Logger } from '../lib/logger';
import { hashToken } from '../lib/tokens';
import { readCookie } from '../middleware/station-auth';
import { boardService } from '../modules/board/board.service';
import { stationsRepository, type StationRecord } from '../modules/stations/stations.repository';
import type { Publisher } from './publisher';

/** Every authenticated socket is in the board's room: what the board shows, every screen may. */
export const BOARD_ROOM = 'board';
export const machineRoom = (machineId: string) => `machine:${machineId}`;
/** A device's sockets, so that revoking the station can close them wherever they are connected. */
const stationRoom = (stationId: string) => `station:${stationId}`;

/** The table the PostgreSQL adapter keeps large messages in (created by a migration). */
const ATTACHMENTS_TABLE = 'socket_io_attachments';

export type JoinAnswer = { ok: true } | { ok: false; code: 'forbidden' | 'validation_failed' };

/** Who is behind a socket, settled once at the handshake. */
interface SocketData {
  station?: Pick<StationRecord, 'id' | 'kind' | 'machineId'>;
  member?: { id: string; role: Role };
}
type LiveSocket = Socket<Record<string, never>, Record<string, never>, Record<string, never>, SocketData>;

export interface SignIn {
  /** The web session middleware of the app (express-session on PostgreSQL). */
  session: RequestHandler;
  /** The app's Passport, which turns a session into `req.user`. */
  passport: InstanceType<typeof Passport>;
}

export interface LiveUpdates extends Publisher {
  /** Serves socket.io at /api/live on the app's HTTP server; announcements go out from then on. */
  attach(server: HttpServer, signIn: SignIn): Server;
  /** Closes every socket and the adapter's connections; the HTTP server is closed with it. */
  close(): Promise<void>;
}

export interface LiveOptions {
  /** How often this process tells the others it is alive (the adapter's default is 5 s). */
  heartbeatIntervalMs?: number;
}

/**
 * socket.io on the app's own origin and HTTP server. Events fan out to the other server processes
 * through PostgreSQL (NOTIFY, by @socket.io/postgres-adapter), so a change made in one process
 * reaches sockets connected to any of them without another service. Events are hints: a screen
 * refetches what it shows, so an event carries only a machine's id and state.
 */
export function createLiveUpdates({ config, db, logger }: { config: Config; db: Db; logger: Logger }, options: LiveOptions = {}): LiveUpdates {
  const board = boardService({ db });
  const stations = stationsRepository(db);
  let io: Server | undefined;
  let pool: pg.Pool | undefined;
  // Announcements of one machine leave in the order of its changes, each with the state read after it.
  const queues = new Map<string, Promise<void>>();

  async function announceMachine(machineId: string, at: Date): Promise<void> {
    const state = await board.machineState(machineId, new Date());
    if (!state || !io) return;
    const update: MachineUpdate = { machineId, state, at: at.toISOString() };
    io.to(BOARD_ROOM).to(machineRoom(machineId)).emit(MACHINE_UPDATE, update);
  }

  /** A device by its cookie (a paired, unrevoked station of any kind), else a signed-in person. */
  async function admit(socket: LiveSocket, next: (error?: Error) => void): Promise<void> {
    try {
      const request = socket.request as IncomingMessage & { user?: Express.User };
      const token = readCookie(request.headers.cookie, STATION_COOKIE);
      const station = token ? await stations.findByDeviceTokenHash(hashToken(token)) : undefined;
      if (station && !station.revokedAt) {
        socket.data.station = { id: station.id, kind: station.kind, machineId: station.machineId };
        next();
      } else if (request.user) {
        socket.data.member = { id: request.user.id, role: request.user.role };
        next();
      } else {
        next(new Error('unauthorized'));
      }
    } catch (error) {
      logger.warn({ err: error }, 'live updates: a handshake could not be checked');
      next(new Error('unavailable'));
    }
  }

  function connected(socket: LiveSocket): void {
    void socket.join(BOARD_ROOM);
    const { station } = socket.data;
    if (station) {
      void socket.join(stationRoom(station.id));
      if (station.kind === 'machine' && station.machineId) void socket.join(machineRoom(station.machineId));
    }
    socket.on(LIVE_JOIN, (payload: unknown, ack?: unknown) => {
      const answer = (result: JoinAnswer) => {
        if (typeof ack === 'function') ack(result);
      };
      // A device's rooms follow from its pairing; following another machine is for people's screens.
      if (!socket.data.member) return answer({ ok: false, code: 'forbidden' });
      const parsed = liveJoinSchema.safeParse(payload);
      if (!parsed.success) return answer({ ok: false, code: 'validation_failed' });
      void socket.join(machineRoom(parsed.data.machineId));
      answer({ ok: true });
    });
  }

  return {
    machineChanged(machineId) {
      if (!io) return;
      const at = new Date();
      const next = (queues.get(machineId) ?? Promise.resolve())
        .then(() => announceMachine(machineId, at))
        .catch((error: unknown) => logger.warn({ err: error, machineId }, 'live updates: a machine change was not announced'));
      queues.set(machineId, next);
      void next.then(() => {
        if (queues.get(machineId) === next) queues.delete(machineId);
      });
    },

    shopChanged(kind) {
      const update: ShopUpdate = { kind, at: new Date().toISOString() };
      io?.to(BOARD_ROOM).emit(SHOP_UPDATE, update);
    },

    stationRevoked(stationId) {
      io?.in(stationRoom(stationId)).disconnectSockets(true);
    },

    attach(server, signIn) {
      if (io) throw new Error('live updates are already attached to a server');
      pool = new pg.Pool({ connectionString: config.DATABASE_URL, max: 3, application_name: 'chuckkey-live' });
      // The adapter holds one client for LISTEN for good; pg's pool watches only idle clients, so a
      // lost connection on that one would otherwise end the process. The adapter reconnects.
      pool.on('connect', (client) => client.on('error', (error) => logger.warn({ err: error }, 'live updates: database connection lost')));
      pool.on('error', (error) => logger.warn({ err: error }, 'live updates: idle database connection lost'));

      io = new Server(server, {
        path: LIVE_PATH,
        serveClient: false,
        adapter: createAdapter(pool, {
          tableName: ATTACHMENTS_TABLE,
          // Given only when set: the adapter merges its options over its defaults, so an explicit
          // undefined would replace the 5-second heartbeat with one on every timer tick.
          ...(options.heartbeatIntervalMs === undefined ? {} : { heartbeatInterval: options.heartbeatIntervalMs }),
          errorHandler: (error) => logger.warn({ err: error }, 'live updates: a message between processes failed'),
        }),
      });
      // A person's sign-in is read once, at the handshake; later requests of the same connection
      // (engine.io polling carries `sid`) would otherwise read and roll the web session each time.
      const atHandshake =
        (middleware: RequestHandler) =>
        (req: IncomingMessage & { _query?: Record<string, string> }, res: unknown, next: (error?: unknown) => void) => {
          if (req._query?.sid === undefined) middleware(req as never, res as never, next);
          else next();
        };
      io.engine.use(atHandshake(signIn.session));
      io.engine.use(atHandshake(signIn.passport.session()));
      io.use((socket, next) => void admit(socket as LiveSocket, next));
      io.on('connection', (socket) => connected(socket as LiveSocket));
      return io;
    },

    async close() {
      const server = io;
      io = undefined;
      await Promise.allSettled(queues.values());
      await server?.close();
      await pool?.end();
      pool = undefined;
    },
  };
}
