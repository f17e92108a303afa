import { useState } from 'react';
import { ProofChangeSchema } from '@shared/schemas/orders.ts';
import type { ProofPage } from '@shared/schemas/order-views.ts';
import { Button } from '@/components/ui/button.tsx';
import { TextAreaField, TextField } from '@/components/ui/field.tsx';
import { Notice } from '@/components/ui/notice.tsx';
import { formatWhen } from '@/lib/format-when.ts';
import { useAnswerProof } from '../api/mutations.ts';

/** Approve the piece as drawn, or say what should change (required words, checked by the shared schema). */
export function ProofAnswer({ token, proof }: { token: string; proof: ProofPage }) {
  const answer = useAnswerProof(token);
  const [name, setName] = useState('');
  const [asking, setAsking] = useState(false);
  const [message, setMessage] = useState('');
  const [messageError, setMessageError] = useState<string>();

  if (proof.status !== 'open') {
    return (
      <Notice tone={proof.status === 'approved' ? 'success' : 'info'} role="status" title={proof.status === 'approved' ? 'Approved: thank you' : 'Your change request is with the shop'}>
        {proof.answeredAt && <>Answered {formatWhen(proof.answeredAt)}. </>}
        {proof.answerMessage && <>“{proof.answerMessage}”</>}
      </Notice>
    );
  }
  const askForChange = () => {
    const parsed = ProofChangeSchema.safeParse({ message, name });
    if (!parsed.success) {
      setMessageError(parsed.error.issues.find((i) => i.path[0] === 'message')?.message ?? parsed.error.issues[0]?.message);
      return;
    }
    setMessageError(undefined);
    answer.mutate({ approve: false, name: parsed.data.name, message: parsed.data.message });
  };
  return (
    <div className="grid gap-4">
      <TextField label="Your name" hint="So the shop knows who answered." autoComplete="name" value={name} maxLength={100} onChange={(e) => setName(e.target.value)} />
      {asking ? (
        <>
          <TextAreaField label="What should change" value={message} maxLength={2000} onChange={(e) => setMessage(e.target.value)} error={messageError} />
          <div className="flex flex-wrap gap-2">
            <Button busy={answer.isPending} onClick={askForChange}>
              Send change request
            </Button>
            <Button variant="ghost" onClick={() => setAsking(false)}>
              Back
            </Button>
          </div>
        </>
      ) : (
        <div className="flex flex-wrap gap-2">
          <Button busy={answer.isPending} onClick={() => answer.mutate({ approve: true, name })}>
            Approve
          </Button>
          <Button variant="secondary" onClick={() => setAsking(true)}>
            Ask for a change
          </Button>
        </div>
      )}
      {answer.isError && (
        <Notice tone="danger" role="alert" title="Your answer was not sent">
          {answer.error.message}
        </Notice>
      )}
    </div>
  );
}
