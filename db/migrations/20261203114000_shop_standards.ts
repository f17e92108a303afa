// The shop's standards (per-kind starting values, hardware, punches): one JSON document per
// shop, validated by ShopStandardsSchema before it is written. No row = built-in defaults.
import type { Knex } from 'knex';

export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable('shop_standards', (t) => {
    t.integer('shop_id').primary().references('id').inTable('shops').onDelete('CASCADE');
    t.text('document').notNullable();
    t.bigInteger('updated_at').notNullable();
    t.integer('updated_by').nullable().references('id').inTable('users').onDelete('SET NULL');
  });
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.dropTable('shop_standards');
}
