// Orders and customers: customers, their wearers and measurements over time, orders of a
// saved revision at a girth with a stage flow and its history, job-sheet prints, the
// customer's measuring and proof links, photos of orders and patterns, and shop pricing.
// Schema builder only, so it runs on SQLite and PostgreSQL alike.
import type { Knex } from 'knex';

const shopRef = (t: Knex.CreateTableBuilder) => t.integer('shop_id').notNullable().references('id').inTable('shops').onDelete('CASCADE');
const userRef = (t: Knex.CreateTableBuilder, name: string) => t.integer(name).nullable().references('id').inTable('users').onDelete('SET NULL');

export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable('customers', (t) => {
    t.increments('id').primary();
    shopRef(t);
    t.text('name').notNullable();
    t.text('email').notNullable().defaultTo('');
    t.text('phone').notNullable().defaultTo('');
    t.text('notes').notNullable().defaultTo('');
    userRef(t, 'created_by');
    t.bigInteger('created_at').notNullable();
    t.bigInteger('updated_at').notNullable();
    t.index(['shop_id', 'name'], 'customers_shop_name_idx');
  });
  await knex.schema.createTable('wearers', (t) => {
    t.increments('id').primary();
    shopRef(t);
    t.integer('customer_id').notNullable().references('id').inTable('customers').onDelete('CASCADE');
    t.text('name').notNullable();
    t.text('kind').notNullable();
    t.text('notes').notNullable().defaultTo('');
    t.bigInteger('created_at').notNullable();
    t.index(['customer_id'], 'wearers_customer_idx');
  });
  await knex.schema.createTable('measurements', (t) => {
    t.increments('id').primary();
    shopRef(t);
    t.integer('wearer_id').notNullable().references('id').inTable('wearers').onDelete('CASCADE');
    t.double('girth_mm').notNullable();
    t.text('unit').notNullable();
    t.text('part').notNullable();
    t.text('method').notNullable();
    t.text('note').notNullable().defaultTo('');
    t.bigInteger('taken_at').notNullable();
    userRef(t, 'taken_by');
    // Who, in words, when not a member ("Customer (measuring link)").
    t.text('taken_by_label').notNullable().defaultTo('');
    t.bigInteger('created_at').notNullable();
    t.index(['wearer_id', 'taken_at'], 'measurements_wearer_taken_idx');
  });
  await knex.schema.createTable('orders', (t) => {
    t.increments('id').primary();
    shopRef(t);
    // Shop-wide order number people say ("order 1004"); given inside the write transaction.
    t.integer('number').notNullable();
    t.integer('customer_id').notNullable().references('id').inTable('customers').onDelete('CASCADE');
    t.integer('wearer_id').notNullable().references('id').inTable('wearers').onDelete('CASCADE');
    // Patterns are archived, never deleted: an order keeps its pattern.
    t.integer('pattern_id').notNullable().references('id').inTable('patterns').onDelete('RESTRICT');
    t.integer('revision_number').notNullable();
    t.text('fit_from').notNullable(); // size | measurement | later
    t.text('size_name').nullable();
    t.integer('measurement_id').nullable().references('id').inTable('measurements').onDelete('SET NULL');
    t.double('girth_mm').nullable();
    t.text('stage').notNullable();
    t.string('due_date', 10).notNullable(); // YYYY-MM-DD
    t.integer('quantity').notNullable();
    t.text('leather_id').nullable();
    t.text('leather_colour').notNullable().defaultTo('');
    t.text('leather_finish').notNullable().defaultTo('');
    t.text('thread').notNullable().defaultTo('');
    t.text('notes').notNullable().defaultTo('');
    t.integer('bench_minutes').notNullable();
    t.text('hardware').nullable(); // JSON [{ itemId, quantity }] or null = matched from the pattern
    userRef(t, 'created_by');
    t.bigInteger('created_at').notNullable();
    t.bigInteger('updated_at').notNullable();
    t.unique(['shop_id', 'number'], { indexName: 'orders_shop_number_unique' });
    t.index(['shop_id', 'stage', 'due_date'], 'orders_shop_stage_due_idx');
    t.index(['customer_id'], 'orders_customer_idx');
  });
  await knex.schema.createTable('order_events', (t) => {
    t.increments('id').primary();
    t.integer('order_id').notNullable().references('id').inTable('orders').onDelete('CASCADE');
    userRef(t, 'user_id');
    t.text('by_label').notNullable().defaultTo('');
    t.text('kind').notNullable();
    t.text('from_stage').nullable();
    t.text('to_stage').nullable();
    t.text('summary').notNullable();
    t.text('detail').notNullable().defaultTo('{}');
    t.bigInteger('at').notNullable();
    t.index(['order_id', 'id'], 'order_events_order_idx');
  });
  await knex.schema.createTable('order_prints', (t) => {
    t.increments('id').primary();
    t.integer('order_id').notNullable().references('id').inTable('orders').onDelete('CASCADE');
    userRef(t, 'user_id');
    t.text('paper').notNullable();
    t.bigInteger('at').notNullable();
    t.index(['order_id'], 'order_prints_order_idx');
  });
  await knex.schema.createTable('measure_links', (t) => {
    t.increments('id').primary();
    shopRef(t);
    t.integer('order_id').notNullable().references('id').inTable('orders').onDelete('CASCADE');
    t.text('token_hash').notNullable();
    t.text('email').notNullable();
    t.text('message').notNullable().defaultTo('');
    userRef(t, 'created_by');
    t.bigInteger('created_at').notNullable();
    t.bigInteger('expires_at').notNullable();
    t.bigInteger('answered_at').nullable();
    t.integer('measurement_id').nullable().references('id').inTable('measurements').onDelete('SET NULL');
    t.unique(['token_hash'], { indexName: 'measure_links_token_unique' });
    t.index(['order_id'], 'measure_links_order_idx');
  });
  await knex.schema.createTable('proof_links', (t) => {
    t.increments('id').primary();
    shopRef(t);
    t.integer('order_id').notNullable().references('id').inTable('orders').onDelete('CASCADE');
    t.text('token_hash').notNullable();
    userRef(t, 'created_by');
    t.bigInteger('created_at').notNullable();
    t.bigInteger('revoked_at').nullable();
    t.text('status').notNullable(); // open | approved | change-requested
    t.bigInteger('answered_at').nullable();
    t.text('answer_name').notNullable().defaultTo('');
    t.text('answer_message').notNullable().defaultTo('');
    t.unique(['token_hash'], { indexName: 'proof_links_token_unique' });
    t.index(['order_id'], 'proof_links_order_idx');
  });
  await knex.schema.createTable('photos', (t) => {
    t.increments('id').primary();
    shopRef(t);
    t.integer('order_id').nullable().references('id').inTable('orders').onDelete('CASCADE');
    t.integer('pattern_id').nullable().references('id').inTable('patterns').onDelete('CASCADE');
    // Generated names in the FileStore; never what the uploader called the file.
    t.text('storage_key').notNullable();
    t.text('thumb_key').notNullable();
    t.text('content_type').notNullable();
    t.integer('byte_size').notNullable();
    t.integer('width_px').notNullable();
    t.integer('height_px').notNullable();
    t.text('caption').notNullable().defaultTo('');
    userRef(t, 'created_by');
    t.bigInteger('created_at').notNullable();
    t.index(['order_id'], 'photos_order_idx');
    t.index(['pattern_id'], 'photos_pattern_idx');
  });
  await knex.schema.createTable('shop_pricing', (t) => {
    t.integer('shop_id').primary().references('id').inTable('shops').onDelete('CASCADE');
    t.text('document').notNullable(); // JSON, validated by ShopPricingSchema before it is written
    userRef(t, 'updated_by');
    t.bigInteger('updated_at').notNullable();
  });
}

export async function down(knex: Knex): Promise<void> {
  for (const table of ['shop_pricing', 'photos', 'proof_links', 'measure_links', 'order_prints', 'order_events', 'orders', 'measurements', 'wearers', 'customers']) {
    await knex.schema.dropTableIfExists(table);
  }
}
