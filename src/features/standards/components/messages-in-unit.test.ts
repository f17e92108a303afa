import { describe, expect, it } from 'vitest';
import { messageInUnit } from './messages-in-unit.ts';

describe('standards messages in the page unit', () => {
  it('when the page shows inches, then a mm limit reads in inches to 1/32 in (300 mm = 11 13/16 in, 25.4 mm per inch)', () => {
    expect(messageInUnit('Ease must be at most 300 mm', 'in')).toBe('Ease must be at most 11 13/16 in');
  });
  it('when the field is a stitch pitch or a punch, then it stays in mm as the field shows it', () => {
    expect(messageInUnit('Stitch pitch must be at least 1.5 mm', 'in')).toBe('Stitch pitch must be at least 1.5 mm');
    expect(messageInUnit('Punch diameter must be at most 25 mm', 'in')).toBe('Punch diameter must be at most 25 mm');
  });
  it('when the page shows mm, then the message is unchanged', () => {
    expect(messageInUnit('Width must be at least 3 mm', 'mm')).toBe('Width must be at least 3 mm');
  });
});
