// Proof links: members make and withdraw them from an order; the customer's page reads,
// approves or asks for a change, and sees that order's photos (public: the token is the
// permission, and it reaches nothing but its own order).
import { Router } from 'express';
import { ApproveProofSchema, ProofChangeSchema } from '@shared/schemas/orders.ts';
import { param, route } from '../../http/allow.ts';
import { authOf } from '../../http/require-role.ts';
import { validate as body } from '../../http/validate.ts';
import { sendImage } from '../photos/photos.routes.ts';
import type { PhotosService } from '../photos/photos.service.ts';
import type { ProofsService } from './proofs.service.ts';

export function proofsRoutes(proofs: ProofsService, photos: PhotosService): Router {
  const r = Router();
  route(r, 'orders.proof', async (req, res) => {
    res.status(201).json(await proofs.create(authOf(req), param(req, 'id')));
  });
  route(r, 'orders.proofRevoke', async (req, res) => {
    await proofs.revoke(authOf(req), param(req, 'proofId'));
    res.status(204).end();
  });
  route(r, 'proof.view', async (req, res) => {
    res.json(await proofs.page(param(req, 'token')!));
  });
  route(r, 'proof.approve', body(ApproveProofSchema), async (req, res) => {
    res.json(await proofs.approve(param(req, 'token'), req.body));
  });
  route(r, 'proof.change', body(ProofChangeSchema), async (req, res) => {
    res.json(await proofs.change(param(req, 'token'), req.body));
  });
  for (const [action, thumb] of [['proof.photo', false], ['proof.thumb', true]] as const) {
    route(r, action, async (req, res) => {
      const { order } = await proofs.resolve(param(req, 'token'));
      sendImage(res, await photos.fileOf({ orderId: order.id }, param(req, 'photoId'), thumb));
    });
  }
  return r;
}
