import type { ReactNode } from 'react';
import { Wordmark } from '@/components/ui/brand-mark.tsx';

/** The plain frame of a customer's page: no shop navigation, the shop's name at the top. */
export function PublicFrame({ shopName, children }: { shopName?: string; children: ReactNode }) {
  return (
    <div className="min-h-screen">
      <header className="border-b border-hide-800 bg-hide-900">
        <div className="mx-auto flex h-14 max-w-4xl items-center justify-between gap-3 px-4 sm:px-6">
          <span className="truncate font-semibold text-paper">{shopName ?? ''}</span>
          <Wordmark className="shrink-0 text-sm text-hide-300" />
        </div>
      </header>
      <main className="mx-auto max-w-4xl px-4 py-8 sm:px-6">{children}</main>
    </div>
  );
}
