import type { Db } from '../../db/knex.ts';
import type { PeopleResponse, StudioPerson } from '../../contracts/admin-users.ts';
import type { CurrentUser } from '../../contracts/users.ts';
import { failure, ok, type Result } from '../../contracts/result.ts';
import { findPerson, listPeople, setPersonRole, type PersonRow } from './studio-people-repo.ts';

/**
 * The owner's list of people and the staff role. Owners are never changed here (they come from OWNER_EMAILS), so
 * the shop can't lose its last owner, and nobody changes their own role. Sessions re-read the user on every
 * request, so a change applies on the person's next click.
 */
export function createPeopleService(deps: { db: Db; ownerEmails: readonly string[]; now: () => Date }) {
  const toStudioPerson = (row: PersonRow): StudioPerson => ({
    ...row,
    isListedOwner: deps.ownerEmails.includes(row.email.toLowerCase()),
  });

  async function list(search: string | undefined): Promise<PeopleResponse> {
    return { people: (await listPeople(deps.db, search)).map(toStudioPerson) };
  }

  async function setRole(
    actor: CurrentUser,
    id: number,
    role: 'customer' | 'staff',
  ): Promise<Result<{ person: StudioPerson }>> {
    const person = await findPerson(deps.db, id);
    if (!person) return failure('not-found', `There is no person ${id}.`);
    if (person.id === actor.id) return failure('conflict', 'You can’t change your own role.');
    const studioPerson = toStudioPerson(person);
    if (person.role === 'owner' || studioPerson.isListedOwner) {
      return failure(
        'conflict',
        `${person.name} is an owner (listed in OWNER_EMAILS); owners are set there, not here.`,
      );
    }
    if (person.role !== role) await setPersonRole(deps.db, id, role, deps.now());
    return ok({ person: { ...studioPerson, role } });
  }

  return { list, setRole };
}

export type PeopleService = ReturnType<typeof createPeopleService>;
