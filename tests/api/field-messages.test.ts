// One validation for every route (server/http/zod-fields.ts): a schema's own sentence, which
// already names the field by its label, is shown as it is; an older key-first message gets
// the label in place of the key; zod's default wording is rewritten; `fields` stays keyed by
// path and no message carries a path or a camelCase name (the team's rule for people's screens).
import { describe, expect, it } from 'vitest';
import { z } from 'zod';
import { CreateOrderSchema, ShopPricingSchema } from '@shared/schemas/orders.ts';
import { fieldsOf } from '../../server/http/zod-fields.ts';

const fields = (schema: z.ZodType, value: unknown) => {
  const r = schema.safeParse(value);
  if (r.success) throw new Error('expected a refusal');
  return fieldsOf(r.error, undefined, value);
};

describe('field messages', () => {
  it('when an order field breaks its schema, then the message is the schema sentence alone, with no label or key in front', () => {
    const f = fields(CreateOrderSchema, { wearerId: 1, patternId: 1, fit: { from: 'later' }, dueDate: '2027-03-14', leatherColour: 'x'.repeat(81), quantity: 0 });
    expect(f.leatherColour).toBe('Leather colour must be at most 80 characters');
    expect(f.quantity).toBe('Quantity must be at least 1');
  });

  it('when the shop pricing is wrong, then each message names its field once, by its label', () => {
    const f = fields(ShopPricingSchema, { currency: 'pounds', wasteFactor: 0.5, hourlyRateCents: 0, leathers: [] });
    expect(f).toEqual({ currency: 'Currency must be a three-letter code such as USD', wasteFactor: 'Waste factor must be at least 1' });
  });

  it('when an older schema starts its message with the key, then the key becomes the label (as before)', () => {
    const f = fields(z.object({ engineVersion: z.string({ error: 'engineVersion is required' }) }), {});
    expect(f.engineVersion).toBe('Engine version is required');
  });

  it("when a schema gives no message of its own, then zod's wording becomes a sentence with the label (a length key loses its Mm)", () => {
    const f = fields(z.object({ girthMm: z.number(), note: z.string() }), { note: 5 });
    expect(f.girthMm).toBe('Girth is required');
    expect(f.note).toBe('Note must be text');
  });

  it('when a message is a fragment without the field, then the label goes in front (as before)', () => {
    const f = fields(z.object({ tags: z.array(z.string()).refine((a) => a.length < 2, { error: 'at most one, please' }) }), { tags: ['a', 'b'] });
    expect(f.tags).toBe('Tags: at most one, please');
  });
});
