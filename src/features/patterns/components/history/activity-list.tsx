import { formatWhen } from '@/lib/format-when.ts';
import type { ActivityItem } from '@shared/schemas/library-views.ts';

const num = (v: unknown) => (typeof v === 'number' ? v : undefined);

/** The audit trail in sentences; an action this list does not know yet reads as a change, never as its code. */
export function activitySentence(item: ActivityItem): string {
  const d = item.detail;
  switch (item.action) {
    case 'pattern.created':
      return 'started the pattern';
    case 'pattern.imported':
      return 'imported it from a file';
    case 'pattern.duplicated':
      return 'duplicated it';
    case 'pattern.exported':
      return 'exported it to a file';
    case 'pattern.updated':
      return 'changed its name, tags or archive state';
    case 'revision.saved':
      return `saved revision ${num(d.number) ?? ''}`.trim();
    case 'revision.restored':
      return `restored revision ${num(d.restoredFrom) ?? '?'} as revision ${num(d.number) ?? '?'}`;
    case 'share.created':
      return num(d.revision) ? `made a share link to revision ${num(d.revision)}` : 'made a share link to the latest revision';
    case 'share.revoked':
      return 'revoked a share link';
    case 'photo.added':
      return 'added a photo';
    case 'photo.deleted':
      return 'removed a photo';
    default:
      return 'made a change';
  }
}

export function ActivityList({ items }: { items: readonly ActivityItem[] }) {
  if (items.length === 0) return <p className="text-sm text-hide-600">Nothing recorded yet.</p>;
  return (
    <ol className="space-y-1.5 text-sm" aria-label="Activity" data-testid="activity">
      {items.map((i) => (
        <li key={i.id} className="flex flex-wrap gap-x-2">
          <span className="font-medium text-hide-900">{i.by?.name ?? 'Someone'}</span>
          <span className="text-hide-800">{activitySentence(i)}</span>
          {/* The date keeps to one line: wrapped, its time stood alone under the next entry. */}
          <span className="whitespace-nowrap text-hide-500">· {formatWhen(i.at)}</span>
        </li>
      ))}
    </ol>
  );
}
