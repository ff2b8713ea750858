import { Link } from 'react-router-dom';
import { EmptyState, PageHeader } from '@/components/ui/page';
import { Notice } from '@/components/ui/notice';
import { CautionLine } from '@/components/ui/caution-line';
import { useCloseJar } from '@/features/fridge/api/close-jar';
import { useFridge } from '@/features/fridge/api/get-fridge';
import { FridgeJarCard } from '@/features/fridge/components/fridge-jar-card';
import { useCurrentHousehold } from '@/features/households/use-current-household';
import { paths } from '@shared/paths';
import { can } from '@shared/roles';
import { ReminderOffer } from '@/features/notifications/components/reminder-offer';

export function FridgeRoute() {
  const { hid, role } = useCurrentHousehold();
  const fridge = useFridge(hid);
  const closeJar = useCloseJar(hid);
  const jars = fridge.data?.jars ?? [];

  return (
    <>
      <PageHeader
        title="Fridge"
        lead="Opened jars, soonest use-by first: how long each has been open and what the week's plan leaves in it."
      />
      {fridge.error && (
        <Notice tone="past" role="alert" title="The fridge could not load.">
          {fridge.error.message}
        </Notice>
      )}
      {closeJar.error && (
        <div className="mb-4">
          <Notice tone="past" role="alert">
            {closeJar.error.message}
          </Notice>
        </div>
      )}
      {fridge.isPending && <p className="text-ink-muted">Opening the fridge…</p>}
      {fridge.data && jars.length === 0 && (
        <EmptyState
          title="No jars are open"
          action={
            <Link
              to={paths.shelf(hid)}
              className="inline-flex min-h-11 items-center rounded-lg bg-action px-4 font-bold text-white"
            >
              Go to the shelf
            </Link>
          }
        >
          When someone opens a jar on the shelf or scans its label, its use-by countdown starts here.
        </EmptyState>
      )}
      {jars.length > 0 && (
        <div className="mb-4">
          <ReminderOffer about="a jar’s use-by" />
        </div>
      )}
      {jars.length > 0 && (
        <ul className="grid items-start gap-3 md:grid-cols-2 xl:grid-cols-3" aria-label="Opened jars">
          {jars.map((jar) => (
            <FridgeJarCard
              key={jar.jarId}
              hid={hid}
              canPlan={can(role, 'cook')}
              jar={jar}
              unsealedAdvice={fridge.data?.unsealedAdvice ?? ''}
              busy={closeJar.isSending}
              onClose={(action, kept) =>
                closeJar.close({ id: jar.jarId, code: jar.code, productName: jar.productName }, action, kept)
              }
            />
          ))}
        </ul>
      )}
      {jars.length > 0 && (
        <div className="mt-4">
          <CautionLine about="use-by" />
        </div>
      )}
    </>
  );
}
