// A measuring link the shop has withdrawn: its page answers like a link that has run out.
import type { Knex } from 'knex';

export async function up(knex: Knex): Promise<void> {
  await knex.schema.alterTable('measure_links', (t) => {
    t.bigInteger('revoked_at').nullable();
  });
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.alterTable('measure_links', (t) => {
    t.dropColumn('revoked_at');
  });
}
