import { useSuspenseQuery } from '@tanstack/react-query';
import { meQueryOptions } from '@/features/auth/api/queries.ts';
import { Panel } from '@/components/ui/panel.tsx';

const roleDuties = {
  owner: 'You run the shop: patterns, members and invites are all yours to change.',
  maker: 'You draft and revise the shop’s patterns and print templates.',
  apprentice: 'You can open every pattern in the library and print its template.',
} as const;

/** The signed-in landing screen. */
export function Component() {
  const { data: me } = useSuspenseQuery(meQueryOptions());
  if (!me) return null;
  const firstName = me.user.name.split(/\s+/)[0] ?? me.user.name;
  return (
    <div className="grid gap-6">
      <div>
        <p className="text-sm font-medium uppercase tracking-widest text-hide-500">{me.shop.name}</p>
        <h1 className="mt-1 text-3xl font-semibold tracking-tight text-hide-900">Good to see you, {firstName}.</h1>
        <p className="mt-2 max-w-2xl text-hide-700">{roleDuties[me.role]}</p>
      </div>
      <Panel title="On the bench">
        <p className="text-hide-700">
          Patterns you draft here keep every revision. Each template prints at full size with a calibration
          square, so check the square with a rule before you cut.
        </p>
      </Panel>
    </div>
  );
}
