import type { Knex } from 'knex';
import { caseSensitive } from './support/columns.ts';

/**
 * Visitors design before they sign in, so an artwork upload may belong to a browser session rather than an account:
 * `session_key` is a random key kept in that visitor's session, and signing in hands its uploads to the account
 * (owner set, key cleared). Every upload has exactly one kind of owner.
 */
export async function up(knex: Knex): Promise<void> {
  await knex.raw('ALTER TABLE artwork_uploads MODIFY owner_user_id INT UNSIGNED NULL');
  await knex.schema.alterTable('artwork_uploads', (t) => {
    // Compared byte for byte: it is a secret, like a share token.
    t.string('session_key', 64).collate(caseSensitive).nullable();
    t.index(['session_key'], 'artwork_uploads_session_key_index');
    t.check('(`owner_user_id` IS NULL) <> (`session_key` IS NULL)', [], 'artwork_uploads_one_owner');
  });
}

export async function down(knex: Knex): Promise<void> {
  // Unclaimed uploads have no account to keep them under, so they go.
  await knex('artwork_uploads').whereNull('owner_user_id').delete();
  await knex.schema.alterTable('artwork_uploads', (t) => {
    t.dropChecks('artwork_uploads_one_owner');
    t.dropIndex(['session_key'], 'artwork_uploads_session_key_index');
    t.dropColumn('session_key');
  });
  await knex.raw('ALTER TABLE artwork_uploads MODIFY owner_user_id INT UNSIGNED NOT NULL');
}
