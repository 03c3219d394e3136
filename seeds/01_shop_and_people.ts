import type { Knex } from 'knex';
import { joinedAtBySub } from './data/accounts.ts';
import { demoPeople } from './data/people.ts';
import { at, catalogueStamp } from './data/seed-time.ts';
import { shopSettings } from './data/shop.ts';

export async function seed(knex: Knex): Promise<void> {
  await knex('shop_settings').insert({ ...shopSettings, ...catalogueStamp });
  await knex('users').insert(
    demoPeople.map((person, index) => {
      const joinedAt = at(joinedAtBySub[person.sub]);
      // Ids follow the array order, as userIds in data/accounts.ts names them.
      return {
        id: index + 1,
        google_sub: person.sub,
        email: person.email,
        name: person.name,
        role: person.role,
        created_at: joinedAt,
        updated_at: joinedAt,
      };
    }),
  );
}
