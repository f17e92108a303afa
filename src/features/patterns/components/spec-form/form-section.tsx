import type { ReactNode } from 'react';

/** A group of related spec fields: a fieldset whose legend names the group for screen readers. */
export function FormSection({ title, children, note }: { title: string; children: ReactNode; note?: ReactNode }) {
  return (
    <fieldset className="rounded-lg border border-hide-200 bg-white/70 px-4 pt-2 pb-4">
      <legend className="px-1.5 text-xs font-semibold uppercase tracking-widest text-hide-600">{title}</legend>
      {note && <p className="mb-3 text-xs text-hide-600">{note}</p>}
      <div className="grid grid-cols-2 gap-x-3 gap-y-3">{children}</div>
    </fieldset>
  );
}
