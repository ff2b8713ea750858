import { Link } from 'react-router-dom';
import { Card, EmptyState, PageHeader } from '@/components/ui/page';
import { Notice } from '@/components/ui/notice';
import { useCurrentHousehold } from '@/features/households/use-current-household';
import { useCaughtMail } from '@/features/invitations/api/caught-mail';
import { paths } from '@shared/paths';

/** Development only: what Larderly sent, as the local mail catcher received it. */
export function DevMailRoute() {
  const { hid } = useCurrentHousehold();
  const mail = useCaughtMail(hid, true);
  return (
    <>
      <PageHeader
        title="Caught mail"
        lead="In development Larderly sends e-mail to a local catcher instead of real mailboxes. Newest first."
        actions={
          <Link
            to={paths.household(hid)}
            className="inline-flex min-h-11 items-center rounded-lg border border-line bg-surface px-4 font-bold"
          >
            Back to Household
          </Link>
        }
      />
      {mail.error && <Notice tone="info">{mail.error.message}</Notice>}
      {mail.data?.length === 0 && (
        <EmptyState title="No mail caught yet">Invite someone, or wait for a reminder.</EmptyState>
      )}
      <div className="flex flex-col gap-3">
        {mail.data?.map((message) => (
          <Card key={message.id}>
            <h2 className="text-lg font-bold">{message.subject}</h2>
            <p className="text-sm text-ink-muted">
              To {message.to.join(', ')} · {new Date(message.receivedAt).toLocaleString()}
            </p>
            <pre className="mt-3 whitespace-pre-wrap break-words font-sans text-[0.95rem]">{message.text}</pre>
          </Card>
        ))}
      </div>
    </>
  );
}
