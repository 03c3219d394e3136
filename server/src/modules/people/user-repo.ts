import type { Db } from '../../db/knex.ts';
import type { CurrentUser, Role } from '../../contracts/users.ts';

interface UserRow {
  id: number;
  email: string;
  name: string;
  role: Role;
  google_sub: string | null;
}

const toUser = (row: UserRow): CurrentUser => ({ id: row.id, email: row.email, name: row.name, role: row.role });
const columns = ['id', 'email', 'name', 'role', 'google_sub'] as const;

export async function findUserById(db: Db, id: number): Promise<CurrentUser | undefined> {
  const row = (await db('users').select(columns).where({ id }).first()) as UserRow | undefined;
  return row && toUser(row);
}

export async function findUserForSignIn(
  db: Db,
  googleSub: string,
  email: string,
): Promise<(CurrentUser & { googleSub: string | null }) | undefined> {
  const row: UserRow | undefined = await db('users')
    .select(columns)
    .where({ google_sub: googleSub })
    .orWhere({ email })
    .orderByRaw('google_sub = ? desc', [googleSub])
    .first();
  return row && { ...toUser(row), googleSub: row.google_sub };
}

export async function insertUser(
  db: Db,
  user: { googleSub: string; email: string; name: string; role: Role },
): Promise<number> {
  const [id] = await db('users').insert({
    google_sub: user.googleSub,
    email: user.email,
    name: user.name,
    role: user.role,
  });
  return id;
}

export async function updateUserSignIn(
  db: Db,
  id: number,
  changes: { googleSub: string; name: string; role?: Role },
): Promise<void> {
  await db('users')
    .where({ id })
    .update({ google_sub: changes.googleSub, name: changes.name, ...(changes.role ? { role: changes.role } : {}) });
}
