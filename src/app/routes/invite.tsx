import { useState, type FormEvent } from 'react';
import { Link, useNavigate, useParams } from 'react-router-dom';
import { ROLE_LABELS } from '@shared/roles';
import type { InvitationPreview } from '@shared/schemas/invitations';
import { AuthLayout } from '@/app/layouts/auth-layout';
import { Button } from '@/components/ui/button';
import { TextField } from '@/components/ui/field';
import { Notice } from '@/components/ui/notice';
import { useMe } from '@/features/auth/api/get-me';
import {
  useAcceptInvitation,
  useInvitationPreview,
  type AcceptInput,
} from '@/features/invitations/api/accept-invitation';
import { ApiError } from '@/lib/api-client';
import { paths } from '@shared/paths';

function lead(invitation: InvitationPreview | undefined) {
  if (!invitation) return 'An invitation to share a shelf, a fridge and a week of meals on Larderly.';
  const who = invitation.inviterName ?? 'A keeper';
  return `${who} invited ${invitation.email} to join ${invitation.householdName} as a ${ROLE_LABELS[invitation.role].toLowerCase()}.`;
}

/** /invite/:token, public: join as the signed-in person, or create an account for the invited address. */
export function InviteRoute() {
  const { token = '' } = useParams();
  const { data: me, isPending } = useMe();
  const preview = useInvitationPreview(token);
  const accept = useAcceptInvitation(token);
  const navigate = useNavigate();
  const [name, setName] = useState('');
  const [password, setPassword] = useState('');
  const error = accept.error instanceof ApiError ? accept.error : null;
  const invitation = preview.data;
  const joined = (input?: AcceptInput) =>
    accept.mutate(input, { onSuccess: (accepted) => navigate(paths.today(accepted.householdId), { replace: true }) });

  function createAccount(event: FormEvent) {
    event.preventDefault();
    joined({ name, password });
  }

  const unusable =
    preview.error instanceof ApiError
      ? preview.error.message
      : invitation && invitation.state !== 'pending'
        ? invitation.message
        : null;
  const otherAddress = me && invitation && me.user.email.toLowerCase() !== invitation.email.toLowerCase();

  return (
    <AuthLayout title={invitation ? `Join ${invitation.householdName}` : 'Join a household'} lead={lead(invitation)}>
      <div className="flex flex-col gap-4">
        {error && !error.fields.name && !error.fields.password && (
          <Notice tone="past" role="alert">
            {error.message}
          </Notice>
        )}
        {isPending || preview.isPending ? (
          <p className="text-ink-muted">Checking the invitation…</p>
        ) : unusable ? (
          <>
            <Notice tone="past" role="alert">
              {unusable}
            </Notice>
            <Link
              to={me ? paths.home() : paths.signIn()}
              className="text-center font-bold text-action underline underline-offset-4"
            >
              {me ? 'Go to your households' : 'Sign in'}
            </Link>
          </>
        ) : me ? (
          <>
            <p>
              You are signed in as <span className="font-bold">{me.user.name}</span> ({me.user.email}).
            </p>
            {otherAddress ? (
              <>
                <Notice tone="soon">
                  This invitation was sent to {invitation!.email}, not to your address. Sign in with {invitation!.email}{' '}
                  to join as the person invited, or join with this account: the keepers of {invitation!.householdName}{' '}
                  will be told.
                </Notice>
                <Button disabled={accept.isPending} onClick={() => joined({ confirmOtherAddress: true })}>
                  {accept.isPending ? 'Joining…' : `Join as ${me.user.email}`}
                </Button>
              </>
            ) : (
              <Button disabled={accept.isPending} onClick={() => joined()}>
                {accept.isPending ? 'Joining…' : 'Join with this account'}
              </Button>
            )}
          </>
        ) : (
          <>
            <form onSubmit={createAccount} className="flex flex-col gap-4" noValidate>
              <p className="text-ink-muted">
                New to Larderly? Your account uses the address the invitation was sent to, {invitation?.email}.
              </p>
              <TextField
                label="Your name"
                autoComplete="name"
                value={name}
                onChange={(e) => setName(e.target.value)}
                error={error?.fields.name}
                required
              />
              <TextField
                label="Choose a password"
                type="password"
                autoComplete="new-password"
                hint="At least 10 characters."
                value={password}
                onChange={(e) => setPassword(e.target.value)}
                error={error?.fields.password}
                required
              />
              <Button type="submit" disabled={accept.isPending}>
                {accept.isPending ? 'Joining…' : 'Create account and join'}
              </Button>
            </form>
            <p className="text-center text-ink-muted">
              Already have an account?{' '}
              <Link
                to={paths.signIn(paths.invitation(token))}
                className="font-bold text-action underline underline-offset-4"
              >
                Sign in to join
              </Link>
            </p>
          </>
        )}
      </div>
    </AuthLayout>
  );
}
