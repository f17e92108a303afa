import { paths } from '../../../paths.ts';

/** The screens of one pattern, shown as tabs under its header. */
export function patternTabs(id: number) {
  return [
    { to: paths.patterns.detail.getHref(id), label: 'Pattern', end: true },
    { to: paths.patterns.history.getHref(id), label: 'History' },
  ];
}

/** The numeric id in the address, or a 404 for anything else. */
export function idFromParams(raw: string | undefined): number {
  const id = Number(raw);
  if (!Number.isInteger(id) || id < 1) throw new Response('Not found', { status: 404 });
  return id;
}
