import { memo, useEffect } from 'react';
import { useBlocker } from 'react-router-dom';
import { Button } from '@/components/ui/button.tsx';

/**
 * Unsaved spec changes are a maker's work: leaving the pattern (a link, back, closing the
 * tab) asks first. Saving, or choosing to leave, lets the navigation through.
 */
export const LeaveGuard = memo(function LeaveGuard({ dirty }: { dirty: boolean }) {
  const blocker = useBlocker(({ currentLocation, nextLocation }) => dirty && currentLocation.pathname !== nextLocation.pathname);

  useEffect(() => {
    if (!dirty) return;
    const onBeforeUnload = (e: BeforeUnloadEvent) => e.preventDefault();
    window.addEventListener('beforeunload', onBeforeUnload);
    return () => window.removeEventListener('beforeunload', onBeforeUnload);
  }, [dirty]);

  if (blocker.state !== 'blocked') return null;
  return (
    <div role="alertdialog" aria-modal="true" aria-labelledby="leave-title" className="fixed inset-0 z-50 grid place-items-center bg-hide-900/40 px-4">
      <div className="w-full max-w-sm rounded-lg bg-paper p-6 shadow-xl">
        <h2 id="leave-title" className="text-lg font-semibold text-hide-900">
          Leave without saving?
        </h2>
        <p className="mt-2 text-sm text-hide-700">The changes in the form are not saved as a revision yet.</p>
        <div className="mt-5 flex justify-end gap-2">
          <Button variant="secondary" autoFocus onClick={() => blocker.reset()}>
            Stay and save
          </Button>
          <Button variant="danger" onClick={() => blocker.proceed()}>
            Leave
          </Button>
        </div>
      </div>
    </div>
  );
});
