import { useState, type FormEvent } from 'react';
import { Link } from 'react-router-dom';
import { dateWords } from '@shared/words';
import { ROLE_LABELS, ROLES, type Role } from '@shared/roles';
import { Button } from '@/components/ui/button';
import { SelectField, TextField } from '@/components/ui/field';
import { FormFooter } from '@/components/ui/form-footer';
import { ApiError } from '@/lib/api-client';
import { useCaughtMail } from '../api/caught-mail';
import { useInvitations, useInvite, useRevokeInvitation } from '../api/invitations';
import { paths } from '@shared/paths';

/** Keepers invite by e-mail with a role, see who has not joined yet and withdraw an invitation. */
export function InvitationPanel({ hid }: { hid: string }) {
  const pending = useInvitations(hid, true);
  const invite = useInvite(hid);
  const revoke = useRevokeInvitation(hid);
  const mailbox = useCaughtMail(hid, true);
  const [email, setEmail] = useState('');
  const [role, setRole] = useState<Role>('cook');
  const error = invite.error instanceof ApiError ? invite.error : null;

  function submit(event: FormEvent) {
    event.preventDefault();
    invite.mutate({ email, role }, { onSuccess: () => setEmail('') });
  }

  return (
    <div className="flex flex-col gap-4">
      <form onSubmit={submit} className="flex flex-col gap-3" noValidate>
        <div className="grid gap-3 sm:grid-cols-[2fr_1fr]">
          <TextField
            label="Invite by e-mail"
            type="email"
            autoComplete="off"
            value={email}
            onChange={(e) => setEmail(e.target.value)}
            error={error?.fields.email}
            required
          />
          <SelectField label="As" value={role} onChange={(e) => setRole(e.target.value as Role)}>
            {ROLES.map((r) => (
              <option key={r} value={r}>
                {ROLE_LABELS[r]}
              </option>
            ))}
          </SelectField>
        </div>
        {invite.isSuccess && (
          <p role="status" className="text-sm text-action">
            Invitation sent to {invite.data.invitation.email}. The link works once, for 7 days.
          </p>
        )}
        <FormFooter error={error} pending={invite.isPending} submitLabel="Send invitation" pendingLabel="Sending…" />
      </form>
      <div>
        <h3 className="font-bold">Waiting to join</h3>
        {pending.data?.length === 0 && <p className="text-ink-muted">No pending invitations.</p>}
        <ul className="divide-y divide-line">
          {pending.data?.map((invitation) => (
            <li key={invitation.id} className="flex flex-wrap items-center justify-between gap-2 py-2">
              <span className="min-w-0">
                <span className="block truncate font-bold">{invitation.email}</span>
                <span className="text-sm text-ink-muted">
                  {ROLE_LABELS[invitation.role]} · link valid until {dateWords(invitation.expiresAt.slice(0, 10))}
                </span>
              </span>
              <Button
                variant="quiet"
                disabled={revoke.isPending}
                onClick={() => revoke.mutate(invitation.id)}
                aria-label={`Withdraw the invitation to ${invitation.email}`}
              >
                Withdraw
              </Button>
            </li>
          ))}
        </ul>
      </div>
      {mailbox.isSuccess && (
        <Link to={paths.caughtMail(hid)} className="text-sm font-bold text-info underline underline-offset-4">
          Development: read the mail the local catcher received ({mailbox.data.length})
        </Link>
      )}
    </div>
  );
}
