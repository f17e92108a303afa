// The customer's proof link of an order (separate from the makers' pattern share link): the
// outline drawing with the finished length and fit range, photos, price and due date, and
// Approve / Ask for a change. It never carries the template, cutter files, cut list or punch
// sizes. Answers are recorded on the order and mailed to the shop.
import type { z } from 'zod';
import type { ApproveProofSchema, ProofChangeSchema } from '@shared/schemas/orders.ts';
import type { ProofAnswered, ProofCreated, ProofPage } from '@shared/schemas/order-views.ts';
import type { PresetName } from '@shared/schemas/strap-spec.ts';
import { writeTransaction } from '../../db/write-transaction.ts';
import { HttpError, notFound } from '../../http/http-error.ts';
import type { AuthContext } from '../../http/session.ts';
import { newToken, plausibleToken, tokenHash } from '../invites/tokens.ts';
import { shopRecipients } from '../measure-links/measure-links.repository.ts';
import { proofAnsweredMail } from '../orders/order-mails.ts';
import { fittedLengths } from '../orders/order-fit.ts';
import { fittedOf, priceContext, priceOf, roundMm } from '../orders/order-view.ts';
import { createOrdersRepository, type ListedOrderRow } from '../orders/orders.repository.ts';
import type { OrdersDeps } from '../orders/orders.service.ts';
import { idParam } from '../patterns/pattern-access.ts';
import { iso } from '../patterns/views.ts';
import { photoView } from '../photos/photo-view.ts';
import { createPhotosRepository } from '../photos/photos.repository.ts';
import { proofSvg } from './proof-drawing.ts';
import { proofView } from './proof-view.ts';
import { createProofsRepository, type ProofRow } from './proofs.repository.ts';

export function createProofsService(deps: OrdersDeps, orderOr404: (shopId: number, raw: string | undefined) => Promise<ListedOrderRow>) {
  const { db, now, config, outbox } = deps;
  const proofs = createProofsRepository(db);
  const orders = createOrdersRepository(db);
  const photos = createPhotosRepository(db);

  /** A live proof link and its order; unknown or revoked answer 404. */
  async function resolve(token: string | undefined, q = db): Promise<{ proof: ProofRow; order: ListedOrderRow }> {
    const proof = plausibleToken(token) ? await proofs.byTokenHash(tokenHash(token), q) : undefined;
    const order = proof && proof.revoked_at === null ? await orders.byId(proof.order_id, q) : undefined;
    if (!proof || !order) throw notFound('proof');
    return { proof, order };
  }

  async function answer(token: string | undefined, approved: boolean, name: string, message: string): Promise<ProofAnswered> {
    const t = now();
    await writeTransaction(db, async (trx) => {
      const { proof, order } = await resolve(token, trx);
      const status = approved ? 'approved' : 'change-requested';
      await proofs.answer(trx, proof.id, { status, answered_at: t, answer_name: name, answer_message: message });
      const who = name || order.customer_name;
      const summary = approved ? `${who} approved the proof.` : `${who} asked for a change: ${message}`;
      await orders.record(trx, { order_id: order.id, user_id: null, by_label: `${who} (proof link)`, kind: approved ? 'proof-approved' : 'proof-change-requested', summary, at: t });
      const mail = proofAnsweredMail({ orderNumber: order.number, wearerName: order.wearer_name, customerName: who, approved, message, link: `${config.publicOrigin}/orders/${order.id}` });
      for (const r of await shopRecipients(trx, order.shop_id, order.created_by)) await outbox.enqueue(trx, { shopId: order.shop_id, kind: 'proof-answered', to: r.email, ...mail });
    });
    outbox.kick();
    return { status: approved ? 'approved' : 'change-requested', answeredAt: iso(t) };
  }

  return {
    resolve,
    async create(auth: AuthContext, raw: string | undefined): Promise<ProofCreated> {
      const order = await orderOr404(auth.shop.id, raw);
      if (order.girth_mm === null) throw new HttpError(409, 'girth_missing', `Order ${order.number} has no girth yet: the proof shows the fitted piece, so measure first.`);
      const token = newToken();
      const t = now();
      const id = await writeTransaction(db, async (trx) => {
        const proofId = await proofs.insert(trx, { shop_id: auth.shop.id, order_id: order.id, token_hash: tokenHash(token), created_by: auth.user.id, created_at: t, status: 'open' });
        await orders.record(trx, { order_id: order.id, user_id: auth.user.id, kind: 'proof-sent', summary: 'Proof link made for the customer.', at: t });
        return proofId;
      });
      return { proof: proofView((await proofs.inShop(id, auth.shop.id))!), token, url: `${config.publicOrigin}/proof/${token}` };
    },

    async revoke(auth: AuthContext, raw: string | undefined): Promise<void> {
      const id = idParam(raw);
      const proof = id === null ? undefined : await proofs.inShop(id, auth.shop.id);
      if (!proof) throw notFound('proof');
      await writeTransaction(db, async (trx) => {
        const t = now();
        await proofs.revoke(trx, proof.id, t);
        await orders.record(trx, { order_id: proof.order_id, user_id: auth.user.id, kind: 'proof-sent', summary: 'Proof link withdrawn.', at: t });
      });
    },

    async page(token: string): Promise<ProofPage> {
      const { proof, order } = await resolve(token);
      const fitted = fittedOf(order);
      const ctx = await priceContext(db, order.shop_id);
      const price = priceOf(order, fitted, ctx);
      const lengths = fitted ? fittedLengths(fitted.layout) : null;
      const base = `/api/proof/${token}/photos`;
      return {
        shopName: order.shop_name,
        orderNumber: order.number,
        customerName: order.customer_name,
        wearer: { name: order.wearer_name, kind: order.wearer_kind as ProofPage['wearer']['kind'] },
        pieceName: order.pattern_name,
        pieceKind: order.pattern_kind as PresetName,
        unit: fitted?.spec.units ?? 'in',
        drawingSvg: fitted ? proofSvg(fitted.layout, fitted.spec) : '',
        finishedLengthMm: lengths?.finishedLengthMm ?? null,
        girthMm: order.girth_mm === null ? null : roundMm(Number(order.girth_mm)),
        fitRangeMm: lengths?.fitRangeMm ?? null,
        leatherColour: order.leather_colour,
        leatherFinish: order.leather_finish,
        quantity: order.quantity,
        // Only a complete price is shown to a customer.
        price: price && price.missing.length === 0 ? { currency: price.currency, totalCents: price.totalCents } : null,
        dueDate: order.due_date,
        photos: (await photos.list({ orderId: order.id })).map((p) => {
          const v = photoView(p, base);
          return { id: v.id, caption: v.caption, url: v.url, thumbUrl: v.thumbUrl };
        }),
        status: proof.status,
        answeredAt: proof.answered_at !== null ? iso(proof.answered_at) : null,
        answerMessage: proof.answer_message,
      };
    },

    approve: (token: string | undefined, input: z.output<typeof ApproveProofSchema>) => answer(token, true, input.name, ''),
    change: (token: string | undefined, input: z.output<typeof ProofChangeSchema>) => answer(token, false, input.name, input.message),
  };
}
export type ProofsService = ReturnType<typeof createProofsService>;
