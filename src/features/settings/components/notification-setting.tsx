import { useQuery } from '@tanstack/react-query';
import { CheckboxField } from '@/components/ui/checkbox-field.tsx';
import { Notice } from '@/components/ui/notice.tsx';
import { settingsQueryOptions, useSaveSettings } from '../api/queries.ts';

/** Whether saves of followed patterns reach me by e-mail (the server sends the note and a link). */
export function NotificationSetting() {
  const settings = useQuery(settingsQueryOptions());
  const save = useSaveSettings();
  if (!settings.data) return <p className="text-sm text-hide-600">Loading…</p>;
  return (
    <div className="grid gap-2">
      <CheckboxField
        label="E-mail me when a pattern I follow gets a new revision"
        hint="You follow a pattern when you save it or press Follow on it."
        checked={save.isPending ? (save.variables?.notifyOnFollowedRevisions ?? false) : settings.data.notifyOnFollowedRevisions}
        disabled={save.isPending}
        onChange={(e) => save.mutate({ notifyOnFollowedRevisions: e.target.checked })}
      />
      {save.isError && (
        <Notice tone="danger" role="alert">
          {save.error.message}
        </Notice>
      )}
    </div>
  );
}
