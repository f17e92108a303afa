// The order form's values as the API's: hardware "as the pattern" is null whatever lines the
// form still holds; "choose lines" sends the lines (an empty list = no hardware); both pass
// the shared schema the API checks with.
import { describe, expect, it } from 'vitest';
import { UpdateOrderSchema } from '@shared/schemas/orders.ts';
import { detailBody, ORDER_DETAIL_FIELDS, type OrderDetailValues } from './order-detail-fields.tsx';

const base: OrderDetailValues = {
  dueDate: '2027-03-14',
  quantity: '1',
  leatherId: '',
  leatherColour: 'Chestnut',
  leatherFinish: '',
  thread: '',
  notes: '',
  benchMinutes: '60',
  hardwareFrom: 'pattern',
  hardware: [{ itemId: 'plate', quantity: '2' }],
};

describe('detailBody', () => {
  it('when hardware is "As the pattern", then it sends null even though the form still holds lines', () => {
    const body = detailBody(base);
    expect(body.hardware).toBeNull();
    expect(UpdateOrderSchema.parse(body).hardware).toBeNull();
  });

  it('when lines are chosen, then it sends them and the schema reads the quantities as numbers', () => {
    const body = detailBody({ ...base, hardwareFrom: 'lines' });
    expect(body.hardware).toEqual([{ itemId: 'plate', quantity: '2' }]);
    expect(UpdateOrderSchema.parse(body).hardware).toEqual([{ itemId: 'plate', quantity: 2 }]);
  });

  it('when "Choose lines" has no line left, then it sends an empty list (no hardware), not null', () => {
    expect(detailBody({ ...base, hardwareFrom: 'lines', hardware: [] }).hardware).toEqual([]);
  });

  it("when a line is refused, then the schema's path is a field the form places the message at", () => {
    const parsed = UpdateOrderSchema.safeParse(detailBody({ ...base, hardwareFrom: 'lines', hardware: [{ itemId: '', quantity: '0' }] }));
    expect(parsed.success).toBe(false);
    const paths = parsed.error!.issues.map((i) => i.path.join('.'));
    expect(paths).toEqual(['hardware.0.itemId', 'hardware.0.quantity']);
    for (const p of paths) expect(ORDER_DETAIL_FIELDS).toContain(p);
    expect(parsed.error!.issues.map((i) => i.message)).toEqual(['Hardware item is required', 'Hardware quantity must be at least 1']);
  });
});
