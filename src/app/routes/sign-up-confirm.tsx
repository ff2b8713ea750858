import { useEffect, useRef } from 'react';
import { Link, useNavigate, useParams } from 'react-router-dom';
import { AuthLayout } from '@/app/layouts/auth-layout';
import { Notice } from '@/components/ui/notice';
import { useConfirmSignUp } from '@/features/auth/api/signup';
import { paths } from '@shared/paths';

/** /sign-up/confirm/:token, the link in the sign-up e-mail: makes the household, then its first-run questions. */
export function SignUpConfirmRoute() {
  const { token = '' } = useParams();
  const confirm = useConfirmSignUp();
  const navigate = useNavigate();
  // The link works once: one request, even when the effect runs twice in development.
  const sent = useRef(false);
  useEffect(() => {
    if (sent.current) return;
    sent.current = true;
    confirm.mutate(token, {
      onSuccess: (me) => navigate(paths.setup(me.memberships[0].householdId), { replace: true }),
    });
  }, [confirm, navigate, token]);

  return (
    <AuthLayout
      title="Finishing your sign-up"
      lead="Your address is confirmed by this link; your household is being made."
    >
      {confirm.error ? (
        <div className="flex flex-col gap-4">
          <Notice tone="past" role="alert">
            {confirm.error.message}
          </Notice>
          <p className="text-center text-ink-muted">
            <Link to={paths.signUp()} className="font-bold text-action underline underline-offset-4">
              Sign up again
            </Link>{' '}
            or{' '}
            <Link to={paths.signIn()} className="font-bold text-action underline underline-offset-4">
              sign in
            </Link>
          </p>
        </div>
      ) : (
        <p role="status">Making your household…</p>
      )}
    </AuthLayout>
  );
}
