import { Link } from 'react-router-dom';
import { buttonClass } from '@/components/ui/button.tsx';
import { Wordmark } from '@/components/ui/brand-mark.tsx';
import { paths } from '../paths.ts';

export function Component() {
  return (
    <main className="grid min-h-screen place-items-center px-6">
      <div className="text-center">
        <Wordmark className="text-lg text-hide-900" />
        <h1 className="mt-6 text-2xl font-semibold text-hide-900">Nothing cut to this shape</h1>
        <p className="mt-2 text-hide-700">There is no page at this address.</p>
        <Link to={paths.home.getHref()} className={buttonClass('primary', 'md', 'mt-6')}>
          Back to the library
        </Link>
      </div>
    </main>
  );
}
