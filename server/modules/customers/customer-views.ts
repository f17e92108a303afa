// Rows -> the answers of shared/schemas/order-views.ts.
import type { BodyPart, GirthUnit, MeasureMethod, WearerKind } from '@shared/schemas/orders.ts';
import type { CustomerView, MeasurementView, WearerView } from '@shared/schemas/order-views.ts';
import { iso } from '../patterns/views.ts';
import type { CustomerRow, MeasurementRow, WearerRow } from './customers.repository.ts';

export const customerView = (r: CustomerRow): CustomerView => ({
  id: r.id,
  name: r.name,
  email: r.email,
  phone: r.phone,
  notes: r.notes,
  createdAt: iso(r.created_at),
  updatedAt: iso(r.updated_at),
  wearerCount: Number(r.wearer_count ?? 0),
  openOrderCount: Number(r.open_order_count ?? 0),
});

export const measurementView = (r: MeasurementRow): MeasurementView => ({
  id: r.id,
  wearerId: r.wearer_id,
  girthMm: Math.round(Number(r.girth_mm) * 1000) / 1000,
  unit: r.unit as GirthUnit,
  part: r.part as BodyPart,
  method: r.method as MeasureMethod,
  note: r.note,
  takenAt: iso(r.taken_at),
  takenBy: r.taken_by !== null ? { id: r.taken_by, name: r.taken_by_name ?? '' } : null,
  takenByLabel: r.taken_by !== null ? (r.taken_by_name ?? '') : r.taken_by_label,
});

export const wearerView = (r: WearerRow, measurements: MeasurementRow[]): WearerView => ({
  id: r.id,
  customerId: r.customer_id,
  name: r.name,
  kind: r.kind as WearerKind,
  notes: r.notes,
  createdAt: iso(r.created_at),
  measurements: measurements.filter((m) => m.wearer_id === r.id).map(measurementView),
});
