import { useState } from 'react';
import type { OrderDetail } from '@shared/schemas/order-views.ts';
import { Badge } from '@/components/ui/badge.tsx';
import { Button } from '@/components/ui/button.tsx';
import { TextAreaField } from '@/components/ui/field.tsx';
import { Notice } from '@/components/ui/notice.tsx';
import { formatWhen } from '@/lib/format-when.ts';
import { useCreateProof, useRequestMeasurement, useRevokeMeasurementRequest, useRevokeProof } from '../../api/mutations.ts';

const PROOF_STATUS = { open: 'Waiting for the customer', approved: 'Approved', 'change-requested': 'Change asked for' } as const;

/**
 * The two links a customer gets: the measuring page (e-mailed) and the proof page (a link to
 * copy and send). Neither is the makers' share link: the proof never carries the template.
 */
export function CustomerLinksPanel({ order, canRequest, canProof }: { order: OrderDetail; canRequest: boolean; canProof: boolean }) {
  const request = useRequestMeasurement(order.id);
  const withdraw = useRevokeMeasurementRequest(order.id);
  const proof = useCreateProof(order.id);
  const revoke = useRevokeProof(order.id);
  const [message, setMessage] = useState('');
  const [copied, setCopied] = useState(false);
  const proofUrl = proof.data ? new URL(proof.data.url, window.location.origin).toString() : null;
  const mailLabel = { sent: 'sent', queued: 'queued to send', failed: 'could not be sent' } as const;

  return (
    <div className="grid gap-5">
      <section aria-labelledby={`measure-${order.id}`} className="grid gap-2">
        <h3 id={`measure-${order.id}`} className="text-sm font-semibold text-hide-900">
          Measurement request
        </h3>
        {!order.customerEmail ? (
          <p className="text-sm text-hide-700">The customer has no e-mail address: add one on their page to send a request.</p>
        ) : (
          canRequest && (
            <>
              <TextAreaField label="Message to the customer" hint={`Goes to ${order.customerEmail} with the link.`} value={message} maxLength={1000} onChange={(e) => setMessage(e.target.value)} />
              <div>
                <Button variant="secondary" busy={request.isPending} onClick={() => request.mutate({ message }, { onSuccess: () => setMessage('') })}>
                  Send measurement request
                </Button>
              </div>
            </>
          )
        )}
        {request.isSuccess && (
          <p role="status" className="text-sm text-moss-700">
            Request {mailLabel[request.data.mail]} to {request.data.request.sentTo}.
          </p>
        )}
        {request.isError && (
          <Notice tone="danger" role="alert" title="The request was not sent">
            {request.error.message}
          </Notice>
        )}
        {order.measurementRequests.length > 0 && (
          <ul className="grid gap-2 text-xs text-hide-700" data-testid="measurement-requests">
            {order.measurementRequests.map((r) => (
              <li key={r.id} className="grid gap-0.5">
                <span className="break-words">
                  Sent to {r.sentTo}, {formatWhen(r.createdAt)}
                </span>
                <span className="flex flex-wrap items-center gap-2">
                  {r.answeredAt ? (
                    <strong className="text-moss-700">answered {formatWhen(r.answeredAt)}</strong>
                  ) : r.revoked ? (
                    <span className="font-medium text-hide-900">revoked</span>
                  ) : r.expired ? (
                    'expired'
                  ) : (
                    `open until ${formatWhen(r.expiresAt)}`
                  )}
                  {canRequest && !r.answeredAt && !r.revoked && !r.expired && (
                    <Button size="sm" variant="ghost" className="h-6 px-2 text-xs" aria-label="Revoke measurement request" busy={withdraw.isPending && withdraw.variables === r.id} onClick={() => withdraw.mutate(r.id)}>
                      Revoke
                    </Button>
                  )}
                </span>
              </li>
            ))}
          </ul>
        )}
        {withdraw.isError && (
          <Notice tone="danger" role="alert" title="The request was not withdrawn">
            {withdraw.error.message}
          </Notice>
        )}
      </section>

      <section aria-labelledby={`proof-${order.id}`} className="grid gap-2 border-t border-hide-100 pt-4">
        <h3 id={`proof-${order.id}`} className="text-sm font-semibold text-hide-900">
          Customer proof
        </h3>
        <p className="text-xs text-hide-600">The customer sees the drawing, finished length and fit, photos, price and due date, and can approve or ask for a change. No template or cutting files.</p>
        {canProof && (
          <div>
            <Button variant="secondary" busy={proof.isPending} onClick={() => proof.mutate()} disabled={order.girthMm === null}>
              Create proof link
            </Button>
            {order.girthMm === null && <p className="mt-1 text-xs text-hide-600">A proof needs the order’s girth first.</p>}
          </div>
        )}
        {proofUrl && (
          <div className="grid gap-1 rounded-md bg-hide-50 p-3">
            <p className="text-xs font-medium text-hide-800">Send this link to the customer (shown once):</p>
            <div className="flex flex-wrap items-center gap-2">
              <a href={proofUrl} className="min-w-0 break-all text-sm text-hide-900 underline" data-testid="proof-url" target="_blank" rel="noreferrer">
                {proofUrl}
              </a>
              <Button
                size="sm"
                variant="ghost"
                onClick={() => void navigator.clipboard?.writeText(proofUrl).then(() => setCopied(true), () => setCopied(false))}
              >
                {copied ? 'Copied' : 'Copy'}
              </Button>
            </div>
          </div>
        )}
        {proof.isError && (
          <Notice tone="danger" role="alert" title="No proof link was made">
            {proof.error.message}
          </Notice>
        )}
        {order.proofs.length > 0 && (
          <ul className="grid gap-2" data-testid="proof-links">
            {order.proofs.map((p) => (
              <li key={p.id} className="flex flex-wrap items-center gap-2 text-xs text-hide-700">
                <Badge tone={p.revoked ? 'hide' : p.status === 'approved' ? 'moss' : p.status === 'change-requested' ? 'thread' : 'brass'}>
                  {p.revoked ? 'Revoked' : PROOF_STATUS[p.status]}
                </Badge>
                <span>made {formatWhen(p.createdAt)}{p.createdBy && <> by {p.createdBy.name}</>}</span>
                {p.answeredAt && (
                  <span className="basis-full">
                    {p.answerName || 'The customer'} answered {formatWhen(p.answeredAt)}
                    {p.answerMessage && <>: “{p.answerMessage}”</>}
                  </span>
                )}
                {canProof && !p.revoked && p.status === 'open' && (
                  <Button size="sm" variant="ghost" className="h-6 px-2 text-xs" busy={revoke.isPending && revoke.variables === p.id} onClick={() => revoke.mutate(p.id)}>
                    Revoke
                  </Button>
                )}
              </li>
            ))}
          </ul>
        )}
      </section>
    </div>
  );
}
