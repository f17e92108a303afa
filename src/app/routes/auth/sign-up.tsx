import { Link, useNavigate, useSearchParams } from 'react-router-dom';
import { SignUpForm } from '@/features/auth/components/sign-up-form.tsx';
import { paths, safeRedirect } from '../../paths.ts';

export function Component() {
  const navigate = useNavigate();
  const [params] = useSearchParams();
  const redirectTo = params.get('redirectTo');
  return (
    <div>
      <h1 className="text-2xl font-semibold tracking-tight text-hide-900">Set up your shop</h1>
      <p className="mt-1 mb-8 text-hide-700">You become its owner and can invite makers and apprentices.</p>
      <SignUpForm onSignedUp={() => navigate(safeRedirect(redirectTo), { replace: true })} />
      <p className="mt-8 text-sm text-hide-700">
        Already have an account?{' '}
        <Link to={paths.auth.signIn.getHref(redirectTo)} className="font-semibold text-hide-800 underline decoration-hide-300 underline-offset-4 hover:decoration-hide-600">
          Sign in
        </Link>
      </p>
    </div>
  );
}
