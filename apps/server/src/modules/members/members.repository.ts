import type { Member, MemberListQuery, Role } from '@chuckkey/core';
import { fullName } from '@chuckkey/core';
import type { Knex } from 'knex';
import type { Db } from '../../lib/db';

export interface MemberRecord {
  id: string;
  email: string;
  firstName: string;
  lastName: string;
  role: Role;
  active: boolean;
  passwordHash: string | null;
  createdAt: Date;
}

const columns = {
  id: 'id',
  email: 'email',
  firstName: 'first_name',
  lastName: 'last_name',
  role: 'role',
  active: 'active',
  passwordHash: 'password_hash',
  createdAt: 'created_at',
} as const;

const sortColumns: Record<MemberListQuery['sort'], string[]> = {
  name: ['first_name', 'last_name'],
  email: ['email'],
  role: ['role', 'first_name'],
  createdAt: ['created_at'],
};

/** The signed-in person (also the shape of their profile). */
export function toUser(row: MemberRecord): Express.User {
  return {
    id: row.id,
    email: row.email,
    firstName: row.firstName,
    lastName: row.lastName,
    name: fullName(row.firstName, row.lastName),
    role: row.role,
  };
}

export function toMember(row: MemberRecord): Member {
  return { ...toUser(row), active: row.active, createdAt: row.createdAt.toISOString() };
}

function escapeLike(text: string): string {
  return text.replace(/[\\%_]/g, (c) => `\\${c}`);
}

type MemberFilters = Pick<MemberListQuery, 'search' | 'role'>;

function filtered<Q extends Knex.QueryBuilder>(q: Q, { search, role }: MemberFilters): Q {
  if (search) {
    const pattern = `%${escapeLike(search.toLowerCase())}%`;
    q.where((w) =>
      w.whereRaw("lower(first_name || ' ' || last_name) like ?", [pattern]).orWhereRaw('lower(email::text) like ?', [pattern]),
    );
  }
  if (role) q.where({ role });
  return q;
}

const returning = Object.entries(columns).map(([alias, column]) => `${column} as ${alias}`);

export function membersRepository(db: Db) {
  const table = () => db('members');
  return {
    async findById(id: string): Promise<MemberRecord | undefined> {
      return table().first(columns).where({ id });
    },

    /** Reads the row and locks it until the transaction ends, so a change sees what it replaces. */
    async findByIdForUpdate(id: string): Promise<MemberRecord | undefined> {
      return table().first(columns).where({ id }).forUpdate();
    },

    async findByEmail(email: string): Promise<MemberRecord | undefined> {
      return table().first(columns).where({ email });
    },

    async list(query: MemberListQuery): Promise<{ items: MemberRecord[]; total: number }> {
      const q = filtered(table().select({ ...columns, total: db.raw('count(*) over ()') }), query);
      for (const column of sortColumns[query.sort]) q.orderBy(column, query.order);
      const rows: (MemberRecord & { total: number })[] = await q
        .orderBy('id')
        .limit(query.pageSize)
        .offset((query.page - 1) * query.pageSize);
      // A page past the end has no rows to carry the total; count apart only then.
      const total = rows[0]?.total ?? (query.page > 1 ? await this.count(query) : 0);
      return { items: rows.map(({ total: _total, ...row }) => row), total };
    },

    async count(query: MemberFilters): Promise<number> {
      const [row] = await filtered(table().count<{ count: number }[]>({ count: '*' }), query);
      return Number(row?.count ?? 0);
    },

    async update(id: string, changes: Partial<Pick<MemberRecord, 'role' | 'active' | 'firstName' | 'lastName' | 'email' | 'passwordHash'>>): Promise<MemberRecord | undefined> {
      const values: Record<string, unknown> = { updated_at: db.fn.now() };
      for (const [key, value] of Object.entries(changes)) {
        if (value !== undefined) values[columns[key as keyof typeof columns]] = value;
      }
      const [row] = await table().where({ id }).update(values).returning(returning);
      return row as MemberRecord | undefined;
    },

    async insert(member: { email: string; firstName: string; lastName: string; role: Role; passwordHash: string }): Promise<MemberRecord> {
      const [row] = await table()
        .insert({
          email: member.email,
          first_name: member.firstName,
          last_name: member.lastName,
          role: member.role,
          password_hash: member.passwordHash,
        })
        .returning(returning);
      return row as MemberRecord;
    },

    /** Signs a person out everywhere (optionally keeping one session, the one in use). */
    async endWebSessions(memberId: string, exceptSid?: string): Promise<void> {
      const q = db('web_sessions').whereRaw("sess -> 'passport' ->> 'user' = ?", [memberId]);
      if (exceptSid) q.whereNot({ sid: exceptSid });
      await q.delete();
    },
  };
}
export type MembersRepository = ReturnType<typeof membersRepository>;
