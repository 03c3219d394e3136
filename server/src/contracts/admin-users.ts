import { z } from 'zod';
import { role } from './users.ts';

export const studioPerson = z.object({
  id: z.number().int(),
  name: z.string(),
  email: z.string(),
  role,
  joinedAt: z.string(),
  /** Listed in OWNER_EMAILS: an owner whatever the table says, so the role cannot be changed here. */
  isListedOwner: z.boolean(),
});
export type StudioPerson = z.infer<typeof studioPerson>;

export const peopleQuery = z.object({
  search: z.string().trim().max(100, 'Search with at most 100 characters').optional(),
});
export const peopleResponse = z.object({ people: z.array(studioPerson) });
export type PeopleResponse = z.infer<typeof peopleResponse>;

export const personIdParams = z.object({
  id: z.coerce
    .number({ error: 'Use a person id such as 3' })
    .int('Use a person id such as 3')
    .min(1, 'Use a person id such as 3'),
});

/** The owner grants or removes the staff role; owners come from OWNER_EMAILS, not from this screen. */
export const setRoleRequest = z.object({ role: z.enum(['customer', 'staff'], { error: 'Choose staff or customer' }) });
export type SetRoleRequest = z.infer<typeof setRoleRequest>;

export const personResponse = z.object({ person: studioPerson });
