// Orders: take one (a saved revision at a girth), change it, move it along the stage flow,
// list the board, read one with its history. Every change is an order event (who, when).
import type { z } from 'zod';
import { PART_FOR_KIND, BODY_PART_LABELS, type CreateOrderSchema, type MoveOrderSchema, type OrderFit, type OrderListQuerySchema, type UpdateOrderSchema } from '@shared/schemas/orders.ts';
import type { OrderDetail, OrderSummary } from '@shared/schemas/order-views.ts';
import type { PresetName, StrapSpec } from '@shared/schemas/strap-spec.ts';
import type { PaperId } from '../print/index.ts';
import { writeTransaction } from '../../db/write-transaction.ts';
import { HttpError, badInput, notFound } from '../../http/http-error.ts';
import type { AuthContext } from '../../http/session.ts';
import { createCustomersRepository, type WearerRow } from '../customers/customers.repository.ts';
import { measurementView } from '../customers/customer-views.ts';
import type { LibraryDeps } from '../library-deps.ts';
import { createMeasureLinksRepository } from '../measure-links/measure-links.repository.ts';
import { measureLinkView } from '../measure-links/measure-link-view.ts';
import { idParam, patternOr404 } from '../patterns/pattern-access.ts';
import { photoView } from '../photos/photo-view.ts';
import { createPhotosRepository } from '../photos/photos.repository.ts';
import { proofView } from '../proofs/proof-view.ts';
import { createProofsRepository } from '../proofs/proofs.repository.ts';
import { iso } from '../patterns/views.ts';
import { fitPiece } from './order-fit.ts';
import { printJobSheet } from './job-sheet.service.ts';
import { detailCore, eventView, priceContext, summaryOf } from './order-view.ts';
import { changedWords, girthWords, stageLabel } from './order-words.ts';
import { createOrdersRepository, type ListedOrderRow, type OrderRow } from './orders.repository.ts';

export interface OrdersDeps extends LibraryDeps {
  now: () => number;
}

type Fit = { fit_from: OrderRow['fit_from']; size_name: string | null; measurement_id: number | null; girth_mm: number | null };

export function createOrdersService(deps: OrdersDeps) {
  const { db, now, repos } = deps;
  const orders = createOrdersRepository(db);
  const customers = createCustomersRepository(db);
  const photos = createPhotosRepository(db);
  const proofs = createProofsRepository(db);
  const links = createMeasureLinksRepository(db);

  /** The order `raw` of the asker's shop, or 404 (another shop's ids too). */
  async function orderOr404(shopId: number, raw: string | undefined): Promise<ListedOrderRow> {
    const id = idParam(raw);
    const row = id === null ? undefined : await orders.inShop(id, shopId);
    if (!row) throw notFound('order');
    return row;
  }

  /** Where the girth comes from -> the columns; the engine must be able to draw the piece there. */
  async function resolveFit(fit: OrderFit, wearer: WearerRow, kind: PresetName, spec: StrapSpec, revisionKey: string): Promise<Fit> {
    if (fit.from === 'later') return { fit_from: 'later', size_name: null, measurement_id: null, girth_mm: null };
    if (fit.from === 'size') {
      const piece = fitPiece(revisionKey, spec, { sizeName: fit.sizeName });
      return { fit_from: 'size', size_name: fit.sizeName, measurement_id: null, girth_mm: piece.girthMm };
    }
    const part = PART_FOR_KIND[kind];
    const m = fit.measurementId !== undefined ? await customers.measurementById(fit.measurementId) : await customers.latestMeasurement(wearer.id, part);
    if (!m || m.wearer_id !== wearer.id) {
      const what = fit.measurementId !== undefined ? `That measurement is not one of ${wearer.name}'s` : `${wearer.name} has no ${part === 'other' ? '' : `${BODY_PART_LABELS[part].toLowerCase()} `}measurement yet: add one, or ask the customer for it later`;
      throw badInput({ fit: what });
    }
    fitPiece(revisionKey, spec, { girthMm: Number(m.girth_mm) });
    return { fit_from: 'measurement', size_name: null, measurement_id: m.id, girth_mm: Number(m.girth_mm) };
  }

  async function detail(row: ListedOrderRow): Promise<OrderDetail> {
    const ctx = await priceContext(db, row.shop_id);
    const [events, prints, photoRows, proofRows, linkRows] = await Promise.all([orders.events(row.id), orders.prints(row.id), photos.list({ orderId: row.id }), proofs.ofOrder(row.id), links.ofOrder(row.id)]);
    const live = proofRows.find((p) => p.revoked_at === null);
    const measurement = row.measurement_id !== null ? await customers.measurementById(row.measurement_id) : undefined;
    return {
      ...summaryOf(row, ctx, now(), { thumbId: photoRows[0]?.id, proof: live?.status }),
      ...detailCore(row, ctx),
      measurement: measurement ? measurementView(measurement) : null,
      history: events.map(eventView),
      prints: prints.map((p) => ({ id: p.id, at: iso(p.at), by: p.user_id !== null ? { id: p.user_id, name: p.user_name ?? '' } : null, paper: p.paper })),
      photos: photoRows.map((p) => photoView(p)),
      proofs: proofRows.map(proofView),
      measurementRequests: linkRows.map((l) => measureLinkView(l, now())),
    };
  }

  async function summaries(shopId: number, rows: ListedOrderRow[]): Promise<OrderSummary[]> {
    if (rows.length === 0) return [];
    const ctx = await priceContext(db, shopId);
    const ids = rows.map((r) => r.id);
    const thumbs = new Map((await photos.firstOfOrders(ids)).map((t) => [Number(t.order_id), Number(t.id)]));
    const proof = new Map((await proofs.latestStatus(ids)).map((p) => [Number(p.order_id), p.status]));
    const t = now();
    return rows.map((r) => summaryOf(r, ctx, t, { thumbId: thumbs.get(r.id), proof: proof.get(r.id) }));
  }

  return {
    orderOr404,
    detail,
    ordersOfCustomer: async (shopId: number, customerId: number) => summaries(shopId, await orders.list(shopId, { stages: [], customerId, active: false, sort: 'due', limit: 200 })),

    async list(auth: AuthContext, q: z.output<typeof OrderListQuerySchema>) {
      const rows = await orders.list(auth.shop.id, { stages: q.stage, customerId: q.customerId, dueFrom: q.dueFrom, dueTo: q.dueTo, query: q.query?.trim() || undefined, active: q.active, sort: q.sort, limit: q.limit });
      return { items: await summaries(auth.shop.id, rows) };
    },

    /** The job sheet PDF at the order's girth, logged on the order. */
    jobSheet: async (auth: AuthContext, raw: string | undefined, paper: Exclude<PaperId, 'custom'>) => printJobSheet(db, orders, now, auth, await orderOr404(auth.shop.id, raw), paper),

    async read(auth: AuthContext, raw: string | undefined) {
      return { order: await detail(await orderOr404(auth.shop.id, raw)) };
    },

    async create(auth: AuthContext, input: z.output<typeof CreateOrderSchema>) {
      const wearer = await customers.wearerInShop(input.wearerId, auth.shop.id);
      if (!wearer) throw notFound('wearer');
      const pattern = await patternOr404(repos.patterns, String(input.patternId), auth.shop.id);
      const n = input.revision ?? pattern.head_number;
      const revision = await repos.revisions.byNumber(pattern.id, n);
      if (!revision) throw badInput({ revision: `Revision ${n} of ${pattern.name} does not exist` });
      const spec = JSON.parse(revision.spec) as StrapSpec;
      const fit = await resolveFit(input.fit, wearer, pattern.kind as PresetName, spec, `${pattern.id}/${n}`);
      const t = now();
      const id = await writeTransaction(db, async (trx) => {
        const number = await orders.nextNumber(trx, auth.shop.id);
        const stage = fit.girth_mm === null ? 'waiting-for-measurement' : 'ready-to-cut';
        const orderId = await orders.insert(trx, {
          shop_id: auth.shop.id,
          number,
          customer_id: wearer.customer_id,
          wearer_id: wearer.id,
          pattern_id: pattern.id,
          revision_number: n,
          ...fit,
          stage,
          due_date: input.dueDate,
          quantity: input.quantity,
          leather_id: input.leatherId,
          leather_colour: input.leatherColour,
          leather_finish: input.leatherFinish,
          thread: input.thread,
          notes: input.notes,
          bench_minutes: input.benchMinutes,
          hardware: input.hardware ? JSON.stringify(input.hardware) : null,
          created_by: auth.user.id,
          created_at: t,
          updated_at: t,
        });
        const summary = `Order ${number} taken for ${wearer.name}: ${pattern.name}, revision ${n}, ${girthWords(fit.girth_mm, spec.units)}${fit.size_name ? ` (size ${fit.size_name})` : ''}.`;
        await orders.record(trx, { order_id: orderId, user_id: auth.user.id, kind: 'created', to_stage: stage, summary, at: t });
        return orderId;
      });
      return { order: await detail((await orders.byId(id))!) };
    },

    async update(auth: AuthContext, raw: string | undefined, patch: z.output<typeof UpdateOrderSchema>) {
      const row = await orderOr404(auth.shop.id, raw);
      const spec = JSON.parse(row.spec) as StrapSpec;
      const change: Partial<OrderRow> = {};
      if (patch.fit) {
        const wearer = (await customers.wearerInShop(row.wearer_id, auth.shop.id))!;
        Object.assign(change, await resolveFit(patch.fit, wearer, row.pattern_kind as PresetName, spec, `${row.pattern_id}/${row.revision_number}`));
      }
      const map: Record<string, keyof OrderRow> = { dueDate: 'due_date', quantity: 'quantity', leatherId: 'leather_id', leatherColour: 'leather_colour', leatherFinish: 'leather_finish', thread: 'thread', notes: 'notes', benchMinutes: 'bench_minutes' };
      for (const [k, col] of Object.entries(map)) {
        const v = (patch as Record<string, unknown>)[k];
        if (v !== undefined) (change as Record<string, unknown>)[col] = v;
      }
      if (patch.hardware !== undefined) change.hardware = patch.hardware ? JSON.stringify(patch.hardware) : null;
      const keys = Object.keys(patch).filter((k) => (patch as Record<string, unknown>)[k] !== undefined);
      const t = now();
      await writeTransaction(db, async (trx) => {
        // A girth arriving moves a waiting order on; losing it moves the order back to wait.
        let stage = row.stage;
        if (change.fit_from !== undefined) stage = change.girth_mm === null ? 'waiting-for-measurement' : row.stage === 'waiting-for-measurement' ? 'ready-to-cut' : row.stage;
        await orders.update(trx, row.id, { ...change, stage, updated_at: t });
        const girth = change.fit_from !== undefined ? ` Now ${girthWords(change.girth_mm ?? null, spec.units)}.` : '';
        await orders.record(trx, { order_id: row.id, user_id: auth.user.id, kind: 'updated', summary: `${changedWords(keys)}${girth}`, detail: { fields: keys }, at: t });
        if (stage !== row.stage) {
          await orders.record(trx, { order_id: row.id, user_id: auth.user.id, kind: 'stage', from_stage: row.stage, to_stage: stage, summary: `Moved from ${stageLabel(row.stage)} to ${stageLabel(stage)}.`, at: t });
        }
      });
      return { order: await detail((await orders.byId(row.id))!) };
    },

    async move(auth: AuthContext, raw: string | undefined, input: z.output<typeof MoveOrderSchema>) {
      const row = await orderOr404(auth.shop.id, raw);
      if (input.stage !== 'waiting-for-measurement' && row.girth_mm === null) {
        throw new HttpError(409, 'girth_missing', `Order ${row.number} has no girth yet: add a measurement or choose a size before moving it to ${stageLabel(input.stage)}.`, { stage: 'This order needs a girth first' });
      }
      const t = now();
      await writeTransaction(db, async (trx) => {
        await orders.update(trx, row.id, { stage: input.stage, updated_at: t });
        const note = input.note ? ` ${input.note}` : '';
        const summary = row.stage === input.stage ? `Kept at ${stageLabel(row.stage)}.${note}` : `Moved from ${stageLabel(row.stage)} to ${stageLabel(input.stage)}.${note}`;
        await orders.record(trx, { order_id: row.id, user_id: auth.user.id, kind: 'stage', from_stage: row.stage, to_stage: input.stage, summary, detail: { note: input.note }, at: t });
      });
      return { order: await detail((await orders.byId(row.id))!) };
    },
  };
}
export type OrdersService = ReturnType<typeof createOrdersService>;
