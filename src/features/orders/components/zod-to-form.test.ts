import { describe, expect, it } from 'vitest';
import { MeasurementSchema } from '@shared/schemas/orders.ts';
import { parseInto } from './zod-to-form.ts';

describe('parseInto', () => {
  it('when the shared schema refuses a girth, then the message lands on the renamed input in the unit typed', () => {
    const errors: Record<string, string> = {};
    const out = parseInto(MeasurementSchema, { girthMm: 5, unit: 'cm', part: 'neck', method: 'soft-tape', note: '' }, (name, e) => (errors[name] = e.message ?? ''), '', { girthMm: 'girth' });
    expect(out).toBeNull();
    // The schema's bench range is 20-3000 mm: 2 cm to 300 cm.
    expect(errors).toEqual({ girth: 'Girth must be between 2 cm and 300 cm' });
  });

  it('when every field is acceptable, then the parsed value comes back and nothing is marked', () => {
    const errors: Record<string, string> = {};
    const out = parseInto(MeasurementSchema, { girthMm: 330, unit: 'in', part: 'neck', method: 'soft-tape' }, (name, e) => (errors[name] = e.message ?? ''));
    expect(out?.girthMm).toBe(330);
    expect(errors).toEqual({});
  });
});
