import { Navigate, useSearchParams } from 'react-router-dom';
import { AuthLayout } from '@/app/layouts/auth-layout';
import { useMe } from '@/features/auth/api/get-me';
import { safeNext, SignInForm } from '@/features/auth/components/sign-in-form';

export function SignInRoute() {
  const { data: me } = useMe();
  const [params] = useSearchParams();
  // Signing in refreshes `me` before the form navigates, so this redirect must honour ?next= too.
  if (me) return <Navigate to={safeNext(params.get('next'))} replace />;
  return (
    <AuthLayout title="Welcome back" lead="Sign in to see your shelf, your fridge and this week's plan.">
      <SignInForm />
    </AuthLayout>
  );
}
