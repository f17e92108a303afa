import { useState } from 'react';
import { Button } from '@/components/ui/button.tsx';
import { SelectField } from '@/components/ui/field.tsx';

/** Two revisions to compare, older first. */
export function ComparePicker({ numbers, initial, onCompare }: { numbers: readonly number[]; initial: { from: number; to: number }; onCompare: (from: number, to: number) => void }) {
  const [from, setFrom] = useState(initial.from);
  const [to, setTo] = useState(initial.to);
  return (
    <form
      className="flex flex-wrap items-end gap-3"
      aria-label="Compare two revisions"
      onSubmit={(e) => {
        e.preventDefault();
        onCompare(Math.min(from, to), Math.max(from, to));
      }}
    >
      <SelectField label="From revision" value={from} onChange={(e) => setFrom(Number(e.target.value))} wrapperClassName="w-40">
        {numbers.map((n) => (
          <option key={n} value={n}>
            {n}
          </option>
        ))}
      </SelectField>
      <SelectField label="To revision" value={to} onChange={(e) => setTo(Number(e.target.value))} wrapperClassName="w-40">
        {numbers.map((n) => (
          <option key={n} value={n}>
            {n}
          </option>
        ))}
      </SelectField>
      <Button type="submit" variant="secondary" disabled={from === to}>
        Compare
      </Button>
    </form>
  );
}
