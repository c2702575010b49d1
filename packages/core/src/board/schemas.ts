import { z } from 'zod';
import { openingTimesSchema } from '../shop/hours-schemas';
import { machineCategorySchema } from '../shop/schemas';

/**
 * A machine's state as the wall board shows it. `reserved` (a reservation starting soon) is part of
 * the vocabulary now so that screens handle it; the server produces it once reservations exist.
 */
export const BOARD_STATES = ['available', 'in_use', 'reserved', 'tagged_out', 'offline'] as const;
export const boardStateSchema = z.enum(BOARD_STATES);
export type BoardState = z.infer<typeof boardStateSchema>;

const instant = z.iso.datetime({ offset: true });

/** The board is public: a person is shown by first name and the initial of the last name only. */
export const boardPersonSchema = z.object({ firstName: z.string(), lastInitial: z.string() });
export type BoardPerson = z.infer<typeof boardPersonSchema>;

export const boardMachineSchema = z.object({
  id: z.uuid(),
  name: z.string(),
  category: machineCategorySchema,
  state: boardStateSchema,
  /** Who runs the session, while one runs. */
  member: boardPersonSchema.nullable(),
  startedAt: instant.nullable(),
  nextReservationAt: instant.nullable(),
  tagOut: z.object({ reason: z.string(), since: instant }).nullable(),
});
export type BoardMachine = z.infer<typeof boardMachineSchema>;

export const boardAreaSchema = z.object({
  id: z.uuid(),
  name: z.string(),
  machines: z.array(boardMachineSchema),
});
export type BoardArea = z.infer<typeof boardAreaSchema>;

/**
 * A class meeting coming up: `id` is the meeting's own (a weekly class has one per week, so two may
 * be on the board at once), `classId` the class it belongs to.
 */
export const boardClassSchema = z.object({
  id: z.uuid(),
  name: z.string(),
  startsAt: instant,
  classId: z.uuid().optional(),
  machineName: z.string().optional(),
});
export type BoardClass = z.infer<typeof boardClassSchema>;

/** GET /api/board: everything the wall board shows, in one answer. */
export const boardSchema = z.object({
  shop: z.object({ name: z.string(), timeZone: z.string() }),
  generatedAt: instant,
  today: z.object({
    /** The shop's calendar date, 'YYYY-MM-DD'. */
    date: z.string(),
    /** Whether the shop is open at `generatedAt`. */
    open: z.boolean(),
    /** Today's openings on the shop's wall clock, 'HH:MM'; empty on a closed day. */
    intervals: z.array(openingTimesSchema),
    closure: z.object({ reason: z.string() }).nullable(),
  }),
  supervisorOnDuty: boardPersonSchema.nullable(),
  /** Areas in the shop's order, each with its machines by name; areas without machines are left out. */
  areas: z.array(boardAreaSchema),
  classes: z.array(boardClassSchema),
});
export type Board = z.infer<typeof boardSchema>;

/** The socket.io path of live updates, on the same origin as the API. */
export const LIVE_PATH = '/api/live';
/** Server → client: a machine's state changed; refetch the board. */
export const MACHINE_UPDATE = 'machine:update';
/** Server → client: something shop-wide changed (the supervisor on duty); refetch the board. */
export const SHOP_UPDATE = 'shop:update';
/** Client → server: a signed-in person's screen follows one machine. */
export const LIVE_JOIN = 'join';

/** `at` is the time the change was committed. */
export const machineUpdateSchema = z.object({
  machineId: z.uuid(),
  state: boardStateSchema,
  at: instant,
});
export type MachineUpdate = z.infer<typeof machineUpdateSchema>;

export const shopUpdateKinds = ['duty'] as const;
export const shopUpdateSchema = z.object({
  kind: z.enum(shopUpdateKinds),
  at: instant,
});
export type ShopUpdate = z.infer<typeof shopUpdateSchema>;
export type ShopUpdateKind = ShopUpdate['kind'];

export const liveJoinSchema = z.object({ machineId: z.uuid({ error: 'Not a machine id.' }) });
export type LiveJoin = z.infer<typeof liveJoinSchema>;
