import { Notice } from '@/components/ui/notice.tsx';
import { cautionKind, cautionsFor } from '@shared/pattern/cautions.ts';

/**
 * Shop-floor cautions, shown where a maker prints or downloads a template: the same list the
 * job sheet prints (shared/pattern/cautions.ts), chosen by the pattern's kind.
 */
export function Cautions({ kind }: { kind: string }) {
  return (
    <Notice tone="info" title="Before you cut" className="text-[0.8rem]">
      <ul className="list-disc space-y-0.5 pl-5" data-testid="cautions">
        {cautionsFor(cautionKind(kind)).map((c) => (
          <li key={c}>{c}</li>
        ))}
      </ul>
    </Notice>
  );
}
