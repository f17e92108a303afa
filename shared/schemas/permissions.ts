/**
 * Who may do what: the one permission table. The server's routes guard themselves with it
 * (`allow(action)`), the API tests generate the role x route matrix from it, and the client
 * may read it to hide buttons a role cannot use. `anonymous` marks public routes.
 */
import type { Role } from './auth.ts';

/** Every role the table speaks of: the shop roles plus a visitor without a session. */
export type Actor = Role | 'anonymous';

const ALL: readonly Role[] = ['owner', 'maker', 'apprentice'];
const EDIT: readonly Role[] = ['owner', 'maker'];
const OWNER: readonly Role[] = ['owner'];
const PUBLIC: readonly Actor[] = ['anonymous', 'owner', 'maker', 'apprentice'];

/** One route: method, Express path under /api, and the actors allowed. */
export interface RoutePermission {
  method: 'GET' | 'POST' | 'PATCH' | 'PUT' | 'DELETE';
  path: string;
  actors: readonly Actor[];
}

/** action -> route and allowed actors. */
export const PERMISSIONS = {
  'patterns.list': { method: 'GET', path: '/patterns', actors: ALL },
  'patterns.create': { method: 'POST', path: '/patterns', actors: EDIT },
  'patterns.import': { method: 'POST', path: '/patterns/import', actors: EDIT },
  'patterns.read': { method: 'GET', path: '/patterns/:id', actors: ALL },
  'patterns.update': { method: 'PATCH', path: '/patterns/:id', actors: EDIT },
  'patterns.duplicate': { method: 'POST', path: '/patterns/:id/duplicate', actors: EDIT },
  'patterns.export': { method: 'GET', path: '/patterns/:id/export', actors: EDIT },
  'patterns.compare': { method: 'GET', path: '/patterns/:id/compare', actors: ALL },
  'patterns.activity': { method: 'GET', path: '/patterns/:id/activity', actors: ALL },
  'patterns.follow': { method: 'PUT', path: '/patterns/:id/follow', actors: ALL },
  'patterns.unfollow': { method: 'DELETE', path: '/patterns/:id/follow', actors: ALL },
  'revisions.list': { method: 'GET', path: '/patterns/:id/revisions', actors: ALL },
  'revisions.read': { method: 'GET', path: '/patterns/:id/revisions/:n', actors: ALL },
  'revisions.create': { method: 'POST', path: '/patterns/:id/revisions', actors: EDIT },
  'revisions.restore': { method: 'POST', path: '/patterns/:id/revisions/:n/restore', actors: EDIT },
  'print.pdf': { method: 'GET', path: '/patterns/:id/revisions/:n/pdf', actors: ALL },
  'print.svg': { method: 'GET', path: '/patterns/:id/revisions/:n/svg', actors: ALL },
  'print.cutter': { method: 'GET', path: '/patterns/:id/revisions/:n/cutter.svg', actors: ALL },
  'print.jobs.create': { method: 'POST', path: '/patterns/:id/revisions/:n/print-jobs', actors: ALL },
  'print.jobs.read': { method: 'GET', path: '/print-jobs/:jobId', actors: ALL },
  'print.jobs.file': { method: 'GET', path: '/print-jobs/:jobId/file', actors: ALL },
  // Apprentices print saved revisions (also at a customer's girth, `girth=` on the pdf route), never values of their own: EDIT only.
  'print.trial': { method: 'POST', path: '/patterns/:id/trial-print', actors: EDIT },
  'print.thumbnail': { method: 'GET', path: '/patterns/:id/revisions/:n/thumbnail.svg', actors: ALL },
  'share.list': { method: 'GET', path: '/patterns/:id/shares', actors: EDIT },
  'share.create': { method: 'POST', path: '/patterns/:id/share', actors: EDIT },
  'share.revoke': { method: 'DELETE', path: '/share/:shareId', actors: EDIT },
  'share.view': { method: 'GET', path: '/s/:token', actors: PUBLIC },
  'share.pdf': { method: 'GET', path: '/s/:token/pdf', actors: PUBLIC },
  'share.svg': { method: 'GET', path: '/s/:token/svg', actors: PUBLIC },
  'share.cutter': { method: 'GET', path: '/s/:token/cutter.svg', actors: PUBLIC },
  'share.jobs.create': { method: 'POST', path: '/s/:token/print-jobs', actors: PUBLIC },
  'share.jobs.read': { method: 'GET', path: '/s/:token/print-jobs/:jobId', actors: PUBLIC },
  'share.jobs.file': { method: 'GET', path: '/s/:token/print-jobs/:jobId/file', actors: PUBLIC },
  'members.list': { method: 'GET', path: '/shop/members', actors: ALL },
  'members.update': { method: 'PATCH', path: '/shop/members/:userId', actors: OWNER },
  'members.remove': { method: 'DELETE', path: '/shop/members/:userId', actors: OWNER },
  'invites.list': { method: 'GET', path: '/shop/invites', actors: OWNER },
  'invites.create': { method: 'POST', path: '/shop/invites', actors: OWNER },
  'invites.revoke': { method: 'DELETE', path: '/shop/invites/:inviteId', actors: OWNER },
  'invites.view': { method: 'GET', path: '/invites/:token', actors: PUBLIC },
  'invites.accept': { method: 'POST', path: '/invites/:token/accept', actors: PUBLIC },
  'shops.list': { method: 'GET', path: '/me/shops', actors: ALL },
  'shops.switch': { method: 'POST', path: '/me/shop', actors: ALL },
  'settings.read': { method: 'GET', path: '/me/settings', actors: ALL },
  'settings.update': { method: 'PATCH', path: '/me/settings', actors: ALL },
  'devmail.read': { method: 'GET', path: '/dev/mail', actors: OWNER },
  // Orders and customers (issue 9): apprentices take orders and move them along the flow.
  'customers.list': { method: 'GET', path: '/customers', actors: ALL },
  'customers.create': { method: 'POST', path: '/customers', actors: ALL },
  'customers.read': { method: 'GET', path: '/customers/:id', actors: ALL },
  'customers.update': { method: 'PATCH', path: '/customers/:id', actors: ALL },
  'wearers.create': { method: 'POST', path: '/customers/:id/wearers', actors: ALL },
  'wearers.update': { method: 'PATCH', path: '/wearers/:wearerId', actors: ALL },
  'measurements.list': { method: 'GET', path: '/wearers/:wearerId/measurements', actors: ALL },
  'measurements.create': { method: 'POST', path: '/wearers/:wearerId/measurements', actors: ALL },
  'orders.list': { method: 'GET', path: '/orders', actors: ALL },
  'orders.create': { method: 'POST', path: '/orders', actors: ALL },
  'orders.read': { method: 'GET', path: '/orders/:id', actors: ALL },
  'orders.update': { method: 'PATCH', path: '/orders/:id', actors: ALL },
  'orders.move': { method: 'POST', path: '/orders/:id/stage', actors: ALL },
  'orders.jobSheet': { method: 'GET', path: '/orders/:id/job-sheet.pdf', actors: ALL },
  'orders.requestMeasurement': { method: 'POST', path: '/orders/:id/measurement-request', actors: ALL },
  'orders.measurementRequestRevoke': { method: 'DELETE', path: '/measurement-requests/:requestId', actors: ALL },
  'orders.proof': { method: 'POST', path: '/orders/:id/proof', actors: ALL },
  'orders.proofRevoke': { method: 'DELETE', path: '/proofs/:proofId', actors: ALL },
  'orders.photos.list': { method: 'GET', path: '/orders/:id/photos', actors: ALL },
  'orders.photos.upload': { method: 'POST', path: '/orders/:id/photos', actors: ALL },
  'orders.photos.file': { method: 'GET', path: '/orders/:id/photos/:photoId', actors: ALL },
  'orders.photos.thumb': { method: 'GET', path: '/orders/:id/photos/:photoId/thumb', actors: ALL },
  'orders.photos.delete': { method: 'DELETE', path: '/orders/:id/photos/:photoId', actors: ALL },
  'patterns.photos.list': { method: 'GET', path: '/patterns/:id/photos', actors: ALL },
  'patterns.photos.upload': { method: 'POST', path: '/patterns/:id/photos', actors: EDIT },
  'patterns.photos.file': { method: 'GET', path: '/patterns/:id/photos/:photoId', actors: ALL },
  'patterns.photos.thumb': { method: 'GET', path: '/patterns/:id/photos/:photoId/thumb', actors: ALL },
  'patterns.photos.delete': { method: 'DELETE', path: '/patterns/:id/photos/:photoId', actors: EDIT },
  'pricing.read': { method: 'GET', path: '/shop/pricing', actors: ALL },
  'pricing.update': { method: 'PUT', path: '/shop/pricing', actors: OWNER },
  // The customer's links: the token is the permission.
  'measure.view': { method: 'GET', path: '/measure/:token', actors: PUBLIC },
  'measure.answer': { method: 'POST', path: '/measure/:token', actors: PUBLIC },
  'proof.view': { method: 'GET', path: '/proof/:token', actors: PUBLIC },
  'proof.approve': { method: 'POST', path: '/proof/:token/approve', actors: PUBLIC },
  'proof.change': { method: 'POST', path: '/proof/:token/change', actors: PUBLIC },
  'proof.photo': { method: 'GET', path: '/proof/:token/photos/:photoId', actors: PUBLIC },
  'proof.thumb': { method: 'GET', path: '/proof/:token/photos/:photoId/thumb', actors: PUBLIC },
  'standards.read': { method: 'GET', path: '/shop/standards', actors: ALL },
  'standards.update': { method: 'PUT', path: '/shop/standards', actors: OWNER },
  'standards.start': { method: 'GET', path: '/shop/standards/start/:kind', actors: ALL },
} as const satisfies Record<string, RoutePermission>;

/** A name in {@link PERMISSIONS}, e.g. `'revisions.create'`. */
export type Action = keyof typeof PERMISSIONS;

/** True when `actor` may perform `action` (the client hides what this denies). */
export function can(actor: Actor, action: Action): boolean {
  return (PERMISSIONS[action].actors as readonly Actor[]).includes(actor);
}
