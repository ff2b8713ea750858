import { CautionLine } from '@/components/ui/caution-line';
import { dateWords } from '@shared/words';
import { Notice } from '@/components/ui/notice';
import { PageHeader } from '@/components/ui/page';
import { useToday } from '@/features/today/api/get-today';
import { FridgeCountdowns } from '@/features/today/components/fridge-countdowns';
import { MyTodos } from '@/features/today/components/my-todos';
import { RestockGlance } from '@/features/today/components/restock-glance';
import { TodaySection } from '@/features/today/components/today-section';
import { JarsForToday } from '@/features/today/components/jars-for-today';
import { SealChecks } from '@/features/today/components/seal-checks';
import { useCurrentHousehold } from '@/features/households/use-current-household';
import { useProducts } from '@/features/shelf/api/get-products';
import { FirstProduct } from '@/features/shelf/components/first-product';
import { can } from '@shared/roles';
import { paths } from '@shared/paths';

export function TodayRoute() {
  const { hid, role } = useCurrentHousehold();
  const today = useToday(hid);
  const products = useProducts(hid);
  const view = today.data;

  return (
    <>
      <PageHeader
        title="Today"
        lead={view ? dateWords(view.today) : 'What to open and use, the fridge, restock and your to-dos.'}
      />
      {today.isError && (
        <Notice tone="past" role="alert" title="Today could not be loaded">
          {today.error.message}
        </Notice>
      )}
      {!view && !today.isError && <p className="text-ink-muted">Loading…</p>}
      {view && products.data?.length === 0 && (
        <div className="mb-4">
          <FirstProduct
            hid={hid}
            why="Today fills in once your shelf has jars: add what you preserve, its recipe, then record a batch."
            canCook={can(role, 'cook')}
          />
        </div>
      )}
      {view && (
        <div className="grid gap-4 lg:grid-cols-2">
          {view.sealChecks.length > 0 && (
            <TodaySection id="today-seals" title="Seal check">
              <SealChecks hid={hid} checks={view.sealChecks} />
              {/* The cooling hours are a canning number: the card carries the canning line, as the batch page does. */}
              <CautionLine about="canning" />
            </TodaySection>
          )}
          <TodaySection id="today-use" title="Open and use today" more={{ to: paths.week(hid), label: 'Week' }}>
            <JarsForToday hid={hid} use={view.use} short={view.short} canHandleJars={can(role, 'handleJars')} />
          </TodaySection>
          <TodaySection
            id="today-fridge"
            title="In the fridge"
            more={
              view.fridgeCount > view.fridge.length
                ? { to: paths.fridge(hid), label: `All ${view.fridgeCount}` }
                : { to: paths.fridge(hid), label: 'Fridge' }
            }
          >
            <FridgeCountdowns jars={view.fridge} />
          </TodaySection>
          <TodaySection
            id="today-restock"
            title="Restock suggestions"
            more={{ to: paths.restock(hid), label: 'Restock' }}
          >
            <RestockGlance hid={hid} suggestions={view.restock} />
          </TodaySection>
          <TodaySection
            id="today-todos"
            title="My to-dos"
            more={{ to: paths.todo(hid), label: view.openTodoCount ? `All ${view.openTodoCount} open` : 'To-do' }}
          >
            <MyTodos hid={hid} todos={view.myTodos} />
          </TodaySection>
        </div>
      )}
    </>
  );
}
