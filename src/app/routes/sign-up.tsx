import { AuthLayout } from '@/app/layouts/auth-layout';
import { SignUpForm } from '@/features/auth/components/sign-up-form';

export function SignUpRoute() {
  return (
    <AuthLayout
      title="Start a household"
      lead="One shared shelf, fridge and week for everyone who eats from your jars."
    >
      <SignUpForm />
    </AuthLayout>
  );
}
