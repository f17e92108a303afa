import { ORDER_STAGES, type OrderStage } from '@shared/schemas/orders.ts';
import type { OrderFilters } from './queries.ts';

const DAY = /^\d{4}-\d{2}-\d{2}$/;

/** The order table's filters read from the address (unknown values dropped, never thrown). */
export function orderFiltersFromSearch(params: URLSearchParams): OrderFilters {
  const stage = (params.get('stage') ?? '').split(',').filter((s): s is OrderStage => (ORDER_STAGES as readonly string[]).includes(s));
  const sort = params.get('sort');
  const customerId = Number(params.get('customerId'));
  const f: OrderFilters = {};
  if (stage.length > 0) f.stage = stage;
  if (Number.isInteger(customerId) && customerId > 0) f.customerId = customerId;
  const dueFrom = params.get('dueFrom');
  const dueTo = params.get('dueTo');
  if (dueFrom && DAY.test(dueFrom)) f.dueFrom = dueFrom;
  if (dueTo && DAY.test(dueTo)) f.dueTo = dueTo;
  const query = params.get('query')?.trim();
  if (query) f.query = query;
  if (params.get('active') === 'true') f.active = true;
  if (sort === 'updated' || sort === 'number') f.sort = sort;
  return f;
}

/** The address form of the filters (defaults left out). */
export function orderFiltersToSearch(f: OrderFilters): URLSearchParams {
  const q = new URLSearchParams();
  if (f.stage && f.stage.length > 0) q.set('stage', f.stage.join(','));
  if (f.customerId) q.set('customerId', String(f.customerId));
  if (f.dueFrom) q.set('dueFrom', f.dueFrom);
  if (f.dueTo) q.set('dueTo', f.dueTo);
  if (f.query) q.set('query', f.query);
  if (f.active) q.set('active', 'true');
  if (f.sort && f.sort !== 'due') q.set('sort', f.sort);
  return q;
}
