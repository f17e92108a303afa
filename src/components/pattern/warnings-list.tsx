import type { Warning } from '@shared/pattern/layout-types.ts';
import { Notice } from '@/components/ui/notice.tsx';

/** The engine's warnings, each in its own sentence; risky geometry is shown, never hidden. */
export function WarningsList({ warnings }: { warnings: readonly Warning[] }) {
  if (warnings.length === 0) {
    return (
      <Notice tone="success" role="status">
        No warnings: every hole, slot and fold sits within the shop&rsquo;s limits.
      </Notice>
    );
  }
  return (
    <Notice tone="warning" title={`${warnings.length} ${warnings.length === 1 ? 'thing' : 'things'} to check before cutting`} role="status">
      <ul className="mt-1 list-disc space-y-1 pl-5" data-testid="layout-warnings">
        {warnings.map((w, i) => (
          <li key={`${w.code}-${i}`} data-code={w.code}>
            {w.message}
          </li>
        ))}
      </ul>
    </Notice>
  );
}
