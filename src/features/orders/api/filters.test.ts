import { describe, expect, it } from 'vitest';
import { orderFiltersFromSearch, orderFiltersToSearch } from './filters.ts';

describe('order table filters in the address', () => {
  it('when filters go to the address and back, then they are the same filters', () => {
    const f = { stage: ['cut' as const, 'punched' as const], dueFrom: '2027-01-01', dueTo: '2027-02-01', query: 'Biscuit', active: true, sort: 'number' as const };
    expect(orderFiltersFromSearch(orderFiltersToSearch(f))).toEqual(f);
  });

  it('when the address carries an unknown stage or a malformed date, then they are dropped rather than sent', () => {
    const f = orderFiltersFromSearch(new URLSearchParams('stage=cut,flying&dueFrom=tomorrow&sort=random'));
    expect(f).toEqual({ stage: ['cut'] });
  });
});
