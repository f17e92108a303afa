import { Link, useNavigate, useSearchParams } from 'react-router-dom';
import { SignInForm } from '@/features/auth/components/sign-in-form.tsx';
import { paths, safeRedirect } from '../../paths.ts';

export function Component() {
  const navigate = useNavigate();
  const [params] = useSearchParams();
  const redirectTo = params.get('redirectTo');
  return (
    <div>
      <h1 className="text-2xl font-semibold tracking-tight text-hide-900">Sign in to your shop</h1>
      <p className="mt-1 mb-8 text-hide-700">Pick up the patterns where you left them.</p>
      <SignInForm onSignedIn={() => navigate(safeRedirect(redirectTo), { replace: true })} />
      <p className="mt-8 text-sm text-hide-700">
        New to Latchet?{' '}
        <Link to={paths.auth.signUp.getHref(redirectTo)} className="font-semibold text-hide-800 underline decoration-hide-300 underline-offset-4 hover:decoration-hide-600">
          Set up a shop
        </Link>
      </p>
    </div>
  );
}
