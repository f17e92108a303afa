// Accounts: people, shops, who belongs to which shop in which role, and sign-in sessions.
// Times are integer milliseconds since the Unix epoch (UTC).
import type { Knex } from 'knex';

export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable('users', (t) => {
    t.increments('id').primary();
    t.text('email').notNullable();
    t.text('name').notNullable();
    t.text('password_hash').notNullable();
    t.bigInteger('created_at').notNullable();
    t.unique(['email'], { indexName: 'users_email_unique' });
  });
  await knex.schema.createTable('shops', (t) => {
    t.increments('id').primary();
    t.text('name').notNullable();
    t.bigInteger('created_at').notNullable();
  });
  await knex.schema.createTable('memberships', (t) => {
    t.integer('shop_id').notNullable().references('id').inTable('shops').onDelete('CASCADE');
    t.integer('user_id').notNullable().references('id').inTable('users').onDelete('CASCADE');
    t.enu('role', ['owner', 'maker', 'apprentice']).notNullable();
    t.bigInteger('created_at').notNullable();
    t.primary(['shop_id', 'user_id'], 'memberships_pk');
    t.index(['user_id'], 'memberships_user_id_idx');
  });
  await knex.schema.createTable('sessions', (t) => {
    t.text('id').primary();
    t.integer('user_id').notNullable().references('id').inTable('users').onDelete('CASCADE');
    // The shop the session acts for; a member removed from it loses the session with it.
    t.integer('shop_id').notNullable().references('id').inTable('shops').onDelete('CASCADE');
    t.bigInteger('expires_at').notNullable();
    t.bigInteger('created_at').notNullable();
    t.index(['user_id'], 'sessions_user_id_idx');
    t.index(['expires_at'], 'sessions_expires_at_idx');
  });
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.dropTable('sessions');
  await knex.schema.dropTable('memberships');
  await knex.schema.dropTable('shops');
  await knex.schema.dropTable('users');
}
