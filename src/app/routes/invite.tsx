import { useState, type FormEvent } from 'react';
import { Link, useNavigate, useParams } from 'react-router-dom';
import { AuthLayout } from '@/app/layouts/auth-layout';
import { Button } from '@/components/ui/button';
import { TextField } from '@/components/ui/field';
import { Notice } from '@/components/ui/notice';
import { useMe } from '@/features/auth/api/get-me';
import { useAcceptInvitation } from '@/features/invitations/api/accept-invitation';
import { ApiError } from '@/lib/api-client';

/** /invite/:token, public: join as the signed-in person, or create an account for the invited address. */
export function InviteRoute() {
  const { token = '' } = useParams();
  const { data: me, isPending } = useMe();
  const accept = useAcceptInvitation(token);
  const navigate = useNavigate();
  const [name, setName] = useState('');
  const [password, setPassword] = useState('');
  const error = accept.error instanceof ApiError ? accept.error : null;
  const joined = (account?: { name: string; password: string }) => accept.mutate(account, { onSuccess: (invitation) => navigate(`/h/${invitation.householdId}`, { replace: true }) });

  function createAccount(event: FormEvent) {
    event.preventDefault();
    joined({ name, password });
  }

  return (
    <AuthLayout title="Join a household" lead="Someone invited you to share their shelf, fridge and week of meals on Larderly.">
      <div className="flex flex-col gap-4">
        {error && !error.fields.name && !error.fields.password && (
          <Notice tone="past" role="alert">
            {error.message}
          </Notice>
        )}
        {isPending ? (
          <p className="text-ink-muted">Checking who you are…</p>
        ) : me ? (
          <>
            <p>
              You are signed in as <span className="font-bold">{me.user.name}</span> ({me.user.email}).
            </p>
            <Button disabled={accept.isPending} onClick={() => joined()}>
              {accept.isPending ? 'Joining…' : 'Join with this account'}
            </Button>
          </>
        ) : (
          <>
            <form onSubmit={createAccount} className="flex flex-col gap-4" noValidate>
              <p className="text-ink-muted">New to Larderly? Your account uses the e-mail address the invitation was sent to.</p>
              <TextField label="Your name" autoComplete="name" value={name} onChange={(e) => setName(e.target.value)} error={error?.fields.name} required />
              <TextField label="Choose a password" type="password" autoComplete="new-password" hint="At least 10 characters." value={password} onChange={(e) => setPassword(e.target.value)} error={error?.fields.password} required />
              <Button type="submit" disabled={accept.isPending}>
                {accept.isPending ? 'Joining…' : 'Create account and join'}
              </Button>
            </form>
            <p className="text-center text-ink-muted">
              Already have an account?{' '}
              <Link to={`/sign-in?next=${encodeURIComponent(`/invite/${token}`)}`} className="font-bold text-action underline underline-offset-4">
                Sign in to join
              </Link>
            </p>
          </>
        )}
      </div>
    </AuthLayout>
  );
}
