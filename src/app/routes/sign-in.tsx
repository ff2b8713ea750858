import { Navigate } from 'react-router-dom';
import { AuthLayout } from '@/components/layouts/auth-layout';
import { useMe } from '@/features/auth/api/get-me';
import { SignInForm } from '@/features/auth/components/sign-in-form';

export function SignInRoute() {
  const { data: me } = useMe();
  if (me) return <Navigate to="/" replace />;
  return (
    <AuthLayout title="Welcome back" lead="Sign in to see your shelf, your fridge and this week's plan.">
      <SignInForm />
    </AuthLayout>
  );
}
