// The customer's measuring link: a member e-mails it from an order; the public page explains
// how to measure for the kind of piece and takes two readings that must agree; the answer
// becomes a measurement of the wearer, gives the order its girth (moving it on from
// "waiting for measurement") and mails the shop. A link works once, until it expires, and until
// a member withdraws it (a withdrawn link answers exactly as one that has run out).
import type { z } from 'zod';
import { cautionKind, cautionsFor } from '@shared/pattern/cautions.ts';
import { MEASURE_KINDS, PART_FOR_KIND, PIECE_WORDS, formatGirth, type MeasureAnswerInput, measureAnswerSchema, type MeasurementRequestSchema } from '@shared/schemas/orders.ts';
import type { MeasureAnswered, MeasurePage, MeasurementRequestSent } from '@shared/schemas/order-views.ts';
import type { PresetName, StrapSpec } from '@shared/schemas/strap-spec.ts';
import { writeTransaction } from '../../db/write-transaction.ts';
import { HttpError, notFound } from '../../http/http-error.ts';
import type { AuthContext } from '../../http/session.ts';
import { createCustomersRepository } from '../customers/customers.repository.ts';
import { newToken, plausibleToken, tokenHash } from '../invites/tokens.ts';
import { measureAnsweredMail, measureRequestMail } from '../orders/order-mails.ts';
import { fitPiece } from '../orders/order-fit.ts';
import { parseOr400 } from '../../http/zod-fields.ts';
import { createOrdersRepository, type ListedOrderRow } from '../orders/orders.repository.ts';
import type { OrdersDeps } from '../orders/orders.service.ts';
import { stageLabel } from '../orders/order-words.ts';
import { idParam } from '../patterns/pattern-access.ts';
import { createMeasureLinksRepository, shopRecipients, type MeasureLinkRow } from './measure-links.repository.ts';
import { measureLinkView } from './measure-link-view.ts';

/** The customer's page shows the fit cautions only; blades, punches and dyes are the maker's. */
const fitCautions = (kind: string) => cautionsFor(cautionKind(kind)).filter((c) => !/^(Cut |Strike |Dyes)/.test(c));

export function createMeasureLinksService(deps: OrdersDeps, orderOr404: (shopId: number, raw: string | undefined) => Promise<ListedOrderRow>) {
  const { db, now, config, outbox } = deps;
  const links = createMeasureLinksRepository(db);
  const orders = createOrdersRepository(db);
  const customers = createCustomersRepository(db);

  /** The link and its order, or why it cannot be used (404 unknown, 410 used, expired or withdrawn). */
  async function usable(token: string | undefined, q = db): Promise<{ link: MeasureLinkRow; order: ListedOrderRow }> {
    const link = plausibleToken(token) ? await links.byTokenHash(tokenHash(token), q) : undefined;
    const order = link ? await orders.byId(link.order_id, q) : undefined;
    if (!link || !order) throw notFound('measuring link');
    if (link.answered_at !== null) throw new HttpError(410, 'link_used', 'This measuring link has been used already; the shop has your measurement. Ask them for a new link to send another.');
    // Withdrawn by the shop: the same answer as a link that has run out, so the page shows nothing of the order.
    if (link.revoked_at !== null) throw new HttpError(410, 'link_expired', 'This measuring link has been withdrawn by the shop; ask them for a new one.');
    if (Number(link.expires_at) <= now()) throw new HttpError(410, 'link_expired', 'This measuring link has run out; ask the shop for a new one.');
    return { link, order };
  }

  return {
    async send(auth: AuthContext, raw: string | undefined, input: z.output<typeof MeasurementRequestSchema>): Promise<MeasurementRequestSent> {
      const order = await orderOr404(auth.shop.id, raw);
      if (!order.customer_email) throw new HttpError(409, 'no_customer_email', `${order.customer_name} has no e-mail address yet: add it to the customer first.`, { email: 'The customer needs an e-mail address' });
      const kind = order.pattern_kind as PresetName;
      const token = newToken();
      const t = now();
      const expiresAt = t + config.measureLinkTtlMs;
      const { id, mailId } = await writeTransaction(db, async (trx) => {
        const linkId = await links.insert(trx, { shop_id: auth.shop.id, order_id: order.id, token_hash: tokenHash(token), email: order.customer_email, message: input.message, created_by: auth.user.id, created_at: t, expires_at: expiresAt });
        const mail = measureRequestMail({
          shopName: auth.shop.name,
          customerName: order.customer_name,
          wearerName: order.wearer_name,
          where: MEASURE_KINDS[kind].where,
          pieceWords: PIECE_WORDS[kind],
          message: input.message,
          link: `${config.publicOrigin}/measure/${token}`,
          expiresAt: new Date(expiresAt),
        });
        const queued = await outbox.enqueue(trx, { shopId: auth.shop.id, kind: 'measure-request', to: order.customer_email, ...mail });
        await orders.record(trx, { order_id: order.id, user_id: auth.user.id, kind: 'measurement-requested', summary: `Measuring link e-mailed to ${order.customer_email}.`, at: t });
        return { id: linkId, mailId: queued };
      });
      // Outside the transaction: the member learns whether the mail left; the link stands either way.
      await outbox.flush();
      const row = (await links.ofOrder(order.id)).find((l) => l.id === id)!;
      return { request: measureLinkView(row, now()), mail: (await outbox.statusOf(mailId)) ?? 'queued' };
    },

    /** Withdraws an unanswered request of the asker's shop (another shop's id: 404); withdrawing twice changes nothing. */
    async revoke(auth: AuthContext, raw: string | undefined): Promise<void> {
      const id = idParam(raw);
      const link = id === null ? undefined : await links.inShop(id, auth.shop.id);
      if (!link) throw notFound('measurement request');
      await writeTransaction(db, async (trx) => {
        const fresh = (await links.inShop(link.id, auth.shop.id, trx))!;
        if (fresh.answered_at !== null) throw new HttpError(409, 'request_answered', 'The customer has answered this request already, so there is nothing to withdraw.');
        const t = now();
        if ((await links.revoke(trx, fresh.id, t)) === 1) {
          await orders.record(trx, { order_id: fresh.order_id, user_id: auth.user.id, kind: 'measurement-requested', summary: `Measuring link to ${fresh.email} withdrawn.`, at: t });
        }
      });
    },

    async page(token: string | undefined): Promise<MeasurePage> {
      const { link, order } = await usable(token);
      const kind = order.pattern_kind as PresetName;
      const m = MEASURE_KINDS[kind];
      const spec = JSON.parse(order.spec) as StrapSpec;
      return {
        shopName: order.shop_name,
        customerName: order.customer_name,
        wearer: { name: order.wearer_name, kind: order.wearer_kind as MeasurePage['wearer']['kind'] },
        pieceKind: kind,
        where: m.where,
        howTo: m.howTo,
        minMm: m.minMm,
        maxMm: m.maxMm,
        agreeMm: m.agreeMm,
        unit: spec.units === 'in' ? 'in' : 'cm',
        message: link.message,
        cautions: fitCautions(kind),
        expiresAt: new Date(Number(link.expires_at)).toISOString(),
      };
    },

    async answer(token: string | undefined, raw: MeasureAnswerInput): Promise<MeasureAnswered> {
      const { order } = await usable(token);
      const kind = order.pattern_kind as PresetName;
      const input = parseOr400(measureAnswerSchema(kind), raw ?? {});
      // The mean of the two readings, to the half millimetre (they agree within the tolerance).
      const girthMm = Math.round(input.girthMm + input.confirmGirthMm) / 2;
      const spec = JSON.parse(order.spec) as StrapSpec;
      fitPiece(`${order.pattern_id}/${order.revision_number}`, spec, { girthMm });
      const girthText = formatGirth(girthMm, input.unit);
      const t = now();
      await writeTransaction(db, async (trx) => {
        const { link, order: fresh } = await usable(token, trx);
        const measurementId = await customers.insertMeasurement(trx, {
          shop_id: fresh.shop_id,
          wearer_id: fresh.wearer_id,
          girth_mm: girthMm,
          unit: input.unit,
          part: PART_FOR_KIND[kind],
          method: input.method,
          note: input.note,
          taken_at: t,
          taken_by: null,
          taken_by_label: 'Customer (measuring link)',
          created_at: t,
        });
        // usable() above read the link inside this write transaction, so nothing came between.
        if ((await links.markAnswered(trx, link.id, measurementId, t)) !== 1) throw new HttpError(410, 'link_used', 'This measuring link has been used already.');
        // Leather already cut keeps its girth: the answer is kept on the wearer and the history says so.
        const fills = fresh.stage === 'waiting-for-measurement' || fresh.stage === 'ready-to-cut';
        const stage = fresh.stage === 'waiting-for-measurement' ? 'ready-to-cut' : fresh.stage;
        if (fills) await orders.update(trx, fresh.id, { fit_from: 'measurement', size_name: null, measurement_id: measurementId, girth_mm: girthMm, stage, updated_at: t });
        const kept = fills ? '' : ` The order is at ${stageLabel(fresh.stage)} already, so its girth stays as it was: check with the customer.`;
        await orders.record(trx, { order_id: fresh.id, user_id: null, by_label: `${fresh.customer_name} (measuring link)`, kind: 'measured', summary: `${fresh.customer_name} measured ${fresh.wearer_name}: ${girthText} (readings ${formatGirth(input.girthMm, input.unit)} and ${formatGirth(input.confirmGirthMm, input.unit)}).${kept}`, at: t });
        if (stage !== fresh.stage) {
          await orders.record(trx, { order_id: fresh.id, user_id: null, by_label: 'Latchet', kind: 'stage', from_stage: fresh.stage, to_stage: stage, summary: `Moved from ${stageLabel(fresh.stage)} to ${stageLabel(stage)} with the customer's measurement.`, at: t });
        }
        const mail = measureAnsweredMail({ orderNumber: fresh.number, wearerName: fresh.wearer_name, customerName: fresh.customer_name, girthText, note: input.note, link: `${config.publicOrigin}/orders/${fresh.id}` });
        for (const r of await shopRecipients(trx, fresh.shop_id, fresh.created_by)) await outbox.enqueue(trx, { shopId: fresh.shop_id, kind: 'measure-answered', to: r.email, ...mail });
      });
      outbox.kick();
      return { girthMm, unit: input.unit, thanks: `Thank you: ${order.wearer_name}'s ${MEASURE_KINDS[kind].where} is ${girthText}. The shop has it now.` };
    },
  };
}
export type MeasureLinksService = ReturnType<typeof createMeasureLinksService>;
