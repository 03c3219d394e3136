import type { Db } from '../../db/knex.ts';
import type { Role } from '../../contracts/users.ts';

export interface PersonRow {
  id: number;
  name: string;
  email: string;
  role: Role;
  joinedAt: string;
}

const toPerson = (row: Record<string, any>): PersonRow => ({
  id: row.id,
  name: row.name,
  email: row.email,
  role: row.role,
  joinedAt: new Date(row.created_at).toISOString(),
});
const columns = ['id', 'name', 'email', 'role', 'created_at'];
/** Enough for a small studio's customers; the search narrows it. */
const listLimit = 200;

/** Owners, then staff, then customers, each by name; `search` matches part of a name or e-mail address. */
export async function listPeople(db: Db, search: string | undefined): Promise<PersonRow[]> {
  const query = db('users')
    .select(columns)
    .orderByRaw("FIELD(role, 'owner', 'staff', 'customer')")
    .orderBy('name')
    .limit(listLimit);
  if (search) {
    const pattern = `%${search.replace(/[\\%_]/g, (c) => `\\${c}`)}%`;
    query.where((where) => where.where('name', 'like', pattern).orWhere('email', 'like', pattern));
  }
  return (await query).map(toPerson);
}

export async function findPerson(db: Db, id: number): Promise<PersonRow | undefined> {
  const row = await db('users').select(columns).where({ id }).first();
  return row && toPerson(row);
}

export async function setPersonRole(db: Db, id: number, role: Role, now: Date): Promise<void> {
  await db('users').where({ id }).update({ role, updated_at: now });
}
