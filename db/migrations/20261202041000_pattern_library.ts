// The pattern library: patterns, their immutable revisions, invites, share links, the
// audit trail, the outgoing mail record (an outbox), follows and per-user settings.
import type { Knex } from 'knex';
import { isPostgres } from '../../server/db/dialect.ts';

export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable('patterns', (t) => {
    t.increments('id').primary();
    t.integer('shop_id').notNullable().references('id').inTable('shops').onDelete('CASCADE');
    t.text('name').notNullable();
    t.text('kind').notNullable();
    t.text('tags').notNullable().defaultTo('[]'); // JSON array of strings
    t.boolean('archived').notNullable().defaultTo(false);
    // Number of the newest revision; moved only by the compare-and-set in a write transaction.
    t.integer('head_number').notNullable();
    t.integer('created_by').nullable().references('id').inTable('users').onDelete('SET NULL');
    t.bigInteger('created_at').notNullable();
    t.bigInteger('updated_at').notNullable();
    t.index(['shop_id', 'updated_at'], 'patterns_shop_updated_idx');
    t.index(['shop_id', 'name'], 'patterns_shop_name_idx');
  });
  await knex.schema.createTable('revisions', (t) => {
    t.increments('id').primary();
    // Revisions leave only with their pattern (no route deletes a pattern; archive instead).
    t.integer('pattern_id').notNullable().references('id').inTable('patterns').onDelete('CASCADE');
    t.integer('number').notNullable();
    t.text('spec').notNullable(); // JSON, validated by StrapSpecSchema before it is written
    t.text('engine_version').notNullable();
    // RESTRICT: a SET NULL would be an UPDATE, which the immutability trigger refuses.
    t.integer('author_id').nullable().references('id').inTable('users').onDelete('RESTRICT');
    t.text('note').notNullable().defaultTo('');
    t.integer('restored_from').nullable();
    t.bigInteger('created_at').notNullable();
    t.unique(['pattern_id', 'number'], { indexName: 'revisions_pattern_number_unique' });
  });
  // History is never rewritten: any UPDATE fails; a DELETE fails unless its pattern is gone
  // already (the cascade of deleting the whole pattern, e.g. when a demo seed resets).
  // Triggers are not in Knex's schema builder: one version per dialect, same rule.
  if (isPostgres(knex)) {
    await knex.raw(`CREATE FUNCTION revisions_immutable() RETURNS trigger LANGUAGE plpgsql AS $$
      BEGIN
        IF TG_OP = 'DELETE' AND NOT EXISTS (SELECT 1 FROM patterns WHERE id = OLD.pattern_id) THEN
          RETURN OLD;
        END IF;
        RAISE EXCEPTION 'revisions are immutable';
      END $$`);
    await knex.raw('CREATE TRIGGER revisions_no_update BEFORE UPDATE ON revisions FOR EACH ROW EXECUTE FUNCTION revisions_immutable()');
    await knex.raw('CREATE TRIGGER revisions_no_delete BEFORE DELETE ON revisions FOR EACH ROW EXECUTE FUNCTION revisions_immutable()');
  } else {
    await knex.raw(`CREATE TRIGGER revisions_no_update BEFORE UPDATE ON revisions
      BEGIN SELECT RAISE(ABORT, 'revisions are immutable'); END`);
    await knex.raw(`CREATE TRIGGER revisions_no_delete BEFORE DELETE ON revisions
      WHEN EXISTS (SELECT 1 FROM patterns WHERE id = OLD.pattern_id)
      BEGIN SELECT RAISE(ABORT, 'revisions are immutable'); END`);
  }

  await knex.schema.createTable('invites', (t) => {
    t.increments('id').primary();
    t.integer('shop_id').notNullable().references('id').inTable('shops').onDelete('CASCADE');
    t.text('email').notNullable();
    t.enu('role', ['owner', 'maker', 'apprentice']).notNullable();
    t.text('token_hash').notNullable(); // SHA-256 of the token; the token itself is only in the mail
    t.integer('invited_by').nullable().references('id').inTable('users').onDelete('SET NULL');
    t.bigInteger('expires_at').notNullable();
    t.bigInteger('accepted_at').nullable();
    t.integer('accepted_by').nullable().references('id').inTable('users').onDelete('SET NULL');
    t.bigInteger('revoked_at').nullable();
    t.bigInteger('created_at').notNullable();
    t.unique(['token_hash'], { indexName: 'invites_token_hash_unique' });
    t.index(['shop_id', 'created_at'], 'invites_shop_created_idx');
  });
  await knex.schema.createTable('share_links', (t) => {
    t.increments('id').primary();
    t.integer('pattern_id').notNullable().references('id').inTable('patterns').onDelete('CASCADE');
    t.integer('revision_number').nullable(); // null: the pattern's head when opened
    t.text('token_hash').notNullable();
    t.integer('created_by').nullable().references('id').inTable('users').onDelete('SET NULL');
    t.bigInteger('created_at').notNullable();
    t.bigInteger('revoked_at').nullable();
    t.unique(['token_hash'], { indexName: 'share_links_token_hash_unique' });
    t.index(['pattern_id'], 'share_links_pattern_idx');
  });
  await knex.schema.createTable('audit_events', (t) => {
    t.increments('id').primary();
    t.integer('shop_id').notNullable().references('id').inTable('shops').onDelete('CASCADE');
    t.integer('pattern_id').nullable().references('id').inTable('patterns').onDelete('CASCADE');
    t.integer('user_id').nullable().references('id').inTable('users').onDelete('SET NULL');
    t.text('action').notNullable();
    t.text('detail').notNullable().defaultTo('{}'); // JSON
    t.bigInteger('created_at').notNullable();
    t.index(['shop_id', 'created_at'], 'audit_events_shop_created_idx');
    t.index(['pattern_id', 'created_at'], 'audit_events_pattern_created_idx');
  });
  await knex.schema.createTable('outgoing_mail', (t) => {
    t.increments('id').primary();
    t.integer('shop_id').nullable().references('id').inTable('shops').onDelete('SET NULL');
    t.text('kind').notNullable(); // invite | revision-saved
    t.text('to_email').notNullable();
    t.text('subject').notNullable();
    t.text('text_body').notNullable();
    t.text('html_body').notNullable();
    t.enu('status', ['queued', 'sent', 'failed']).notNullable().defaultTo('queued');
    t.integer('attempts').notNullable().defaultTo(0);
    t.text('last_error').nullable();
    t.bigInteger('created_at').notNullable();
    t.bigInteger('sent_at').nullable();
    t.index(['status', 'id'], 'outgoing_mail_status_idx');
  });
  await knex.schema.createTable('pattern_follows', (t) => {
    t.integer('pattern_id').notNullable().references('id').inTable('patterns').onDelete('CASCADE');
    t.integer('user_id').notNullable().references('id').inTable('users').onDelete('CASCADE');
    t.bigInteger('created_at').notNullable();
    t.primary(['pattern_id', 'user_id'], 'pattern_follows_pk');
    t.index(['user_id'], 'pattern_follows_user_idx');
  });
  await knex.schema.createTable('user_settings', (t) => {
    t.integer('user_id').primary().references('id').inTable('users').onDelete('CASCADE');
    t.boolean('notify_followed_revisions').notNullable().defaultTo(true);
  });
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.dropTable('user_settings');
  await knex.schema.dropTable('pattern_follows');
  await knex.schema.dropTable('outgoing_mail');
  await knex.schema.dropTable('audit_events');
  await knex.schema.dropTable('share_links');
  await knex.schema.dropTable('invites');
  if (isPostgres(knex)) {
    await knex.schema.dropTable('revisions'); // its triggers go with it
    await knex.raw('DROP FUNCTION IF EXISTS revisions_immutable()');
  } else {
    await knex.raw('DROP TRIGGER IF EXISTS revisions_no_delete');
    await knex.raw('DROP TRIGGER IF EXISTS revisions_no_update');
    await knex.schema.dropTable('revisions');
  }
  await knex.schema.dropTable('patterns');
}
