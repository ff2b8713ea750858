import { Link, useParams } from 'react-router-dom';
import { can } from '@shared/roles';
import { UNSEALED_JAR_ADVICE } from '@shared/domain';
import { Brand } from '@/components/ui/brand';
import { Notice } from '@/components/ui/notice';
import { Card } from '@/components/ui/page';
import { CautionLine } from '@/components/ui/caution-line';
import { useJarByCode } from '@/features/shelf/api/get-jar-by-code';
import { JarActions } from '@/features/shelf/components/jar-actions';
import { MoveJar } from '@/features/shelf/components/move-jar';
import { PutBackJar } from '@/features/shelf/components/put-back-jar';
import { JarDates, JarStateBadge, PastBestBadge } from '@/features/shelf/components/jar-badges';
import { dateWords } from '@shared/words';
import { ReminderOffer } from '@/features/notifications/components/reminder-offer';
import { paths } from '@shared/paths';
import { useUnits } from '@/lib/units';

/** What a label's QR code opens: the jar, found by its code in whichever household of yours holds it. */

export function JarRoute() {
  const units = useUnits();
  const { code = '' } = useParams();
  const found = useJarByCode(code);
  const jar = found.data?.jar;
  return (
    <main className="mx-auto flex min-h-dvh max-w-lg flex-col gap-5 p-4">
      <header className="flex items-center justify-between">
        <Link to={paths.home()} aria-label="Larderly home">
          <Brand />
        </Link>
        {found.data && (
          <Link
            to={paths.shelf(found.data.householdId)}
            className="inline-flex min-h-11 items-center rounded-lg px-3 font-bold text-action hover:bg-action-soft"
          >
            {found.data.householdName}’s shelf
          </Link>
        )}
      </header>
      {found.isPending && <p className="text-ink-muted">Finding jar {code.toUpperCase()}…</p>}
      {found.error && (
        <Notice tone="past" role="alert" title={`Jar ${code.toUpperCase()} was not found`}>
          Check the code on the label. A jar shows only to members of its household.
        </Notice>
      )}
      {jar && found.data && (
        <Card className="flex flex-col gap-4">
          <div>
            <p className="font-mono text-lg font-bold tracking-wider text-ink-muted">{jar.code}</p>
            <h1 className="text-3xl">{jar.productName}</h1>
            <p className="text-ink-muted">
              {units.jarSize(jar.jarSize)} jar, canned {dateWords(jar.cannedOn)}
            </p>
          </div>
          <p className="flex flex-wrap items-center gap-2">
            <JarStateBadge jar={jar} />
            {jar.pastBestQuality && <PastBestBadge bestBy={jar.bestBy} />}
          </p>
          <p className="text-lg">
            <JarDates jar={jar} />
          </p>
          {jar.state === 'opened' && <CautionLine about="use-by" />}
          {jar.state === 'opened' && jar.useBy && (
            <ReminderOffer about={`this jar’s use-by (${dateWords(jar.useBy)})`} />
          )}
          {jar.unsealed && jar.state === 'opened' && <Notice tone="soon">{UNSEALED_JAR_ADVICE}</Notice>}
          <MoveJar hid={found.data.householdId} jar={jar} canMove={can(found.data.role, 'handleJars')} />
          <JarActions hid={found.data.householdId} jar={jar} size="large" />
          <PutBackJar
            hid={found.data.householdId}
            jar={jar}
            lastChange={found.data.lastChange}
            canCook={can(found.data.role, 'cook')}
          />
          <Link
            to={paths.batch(found.data.householdId, jar.batchId)}
            className="font-bold text-action underline underline-offset-4"
          >
            The whole batch
          </Link>
        </Card>
      )}
    </main>
  );
}
