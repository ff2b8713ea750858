import { useState } from 'react';
import { Link } from 'react-router-dom';
import { count, countdown, dateWords, DATE_NAMES, JAR_ACTION_NAMES } from '@shared/words';
import { STOCK_WORDS } from '@shared/words/stock';
import type { FridgeJar } from '@shared/schemas/fridge';
import { Button } from '@/components/ui/button';
import { CheckboxField } from '@/components/ui/field';
import { JarDrawing } from '@/components/ui/jar-drawing';
import { CountdownBadge } from '@/components/ui/countdown-badge';
import type { ClosingAction } from '../api/close-jar';
import { paths } from '@shared/paths';

function estimateWords(jar: FridgeJar) {
  const round = (tbsp: number) => Math.round(tbsp * 10) / 10;
  if (jar.estimateFrom === 'jar')
    return `About ${round(jar.remainingTbsp)} of ${round(jar.capacityTbsp)} tbsp left. No meal in the plan uses it yet.`;
  if (jar.estimateTbsp <= 0) return 'The planned meals finish it before its use-by.';
  if (jar.plannedTbsp === 0)
    return `No planned meal draws from this jar before its use-by; about ${round(jar.estimateTbsp)} tbsp left.`;
  return `The plan uses about ${round(jar.plannedTbsp)} tbsp; about ${round(jar.estimateTbsp)} tbsp will be left on its use-by.`;
}

/** Food would be left in it on its use-by: nothing planned finishes it. */
const leftOnUseBy = (jar: FridgeJar) =>
  jar.daysLeft >= 0 && (jar.estimateFrom === 'jar' ? jar.remainingTbsp > 0 : jar.estimateTbsp > 0);

export function FridgeJarCard({
  hid,
  canPlan,
  jar,
  unsealedAdvice,
  onClose,
  busy,
}: {
  hid: string;
  canPlan: boolean;
  jar: FridgeJar;
  unsealedAdvice: string;
  onClose: (action: ClosingAction, kept?: boolean) => void;
  busy: boolean;
}) {
  const [confirmDiscard, setConfirmDiscard] = useState(false);
  const [kept, setKept] = useState(true);
  const { tone } = countdown(jar.daysLeft);
  return (
    <li className="flex flex-col gap-3 rounded-card border border-line bg-surface p-4">
      <div className="flex items-start gap-3">
        <JarDrawing level={jar.capacityTbsp ? jar.remainingTbsp / jar.capacityTbsp : 0} fill={tone} lid="muted" />
        <div className="min-w-0 flex-1">
          <h2 className="text-lg font-bold">{jar.productName}</h2>
          <p className="text-sm text-ink-muted tabular">
            <Link to={paths.jar(jar.code)} className="font-bold text-action underline underline-offset-4">
              Jar {jar.code}
            </Link>{' '}
            · opened {dateWords(jar.openedOn)}, {jar.daysOpen === 0 ? 'today' : `${count(jar.daysOpen, 'day')} ago`}
          </p>
        </div>
        <CountdownBadge daysLeft={jar.daysLeft} />
      </div>
      <p className="tabular">
        <span className="font-bold">
          {DATE_NAMES.useBy} {dateWords(jar.useBy)}.
        </span>{' '}
        {estimateWords(jar)}
      </p>
      {canPlan && leftOnUseBy(jar) && (
        <Link
          to={paths.week(hid, jar.useBy, jar.useBy)}
          className="-mt-1 inline-flex min-h-11 items-center self-start font-bold text-action underline underline-offset-4"
          aria-label={`Plan it on a meal: jar ${jar.code} of ${jar.productName}`}
        >
          Plan it on a meal
        </Link>
      )}
      {jar.unsealed && (
        <p className="rounded-lg border border-soon-fill bg-soon-soft px-3 py-2 text-sm">
          <span className="font-bold">Unsealed jar.</span> {unsealedAdvice} Follow your tested recipe and your local
          extension service; when in doubt, throw it out.
        </p>
      )}
      {confirmDiscard ? (
        <div className="flex flex-wrap items-center gap-2" role="group" aria-label={`Discard jar ${jar.code}?`}>
          <span className="font-bold">Discard what is left of jar {jar.code}?</span>
          <div className="w-full">
            <CheckboxField
              label={STOCK_WORDS.kept}
              hint={STOCK_WORDS.keptHint}
              checked={kept}
              onChange={(e) => setKept(e.target.checked)}
            />
          </div>
          <Button variant="danger" disabled={busy} onClick={() => onClose('discard', kept)}>
            Yes, discard
          </Button>
          <Button variant="secondary" onClick={() => setConfirmDiscard(false)}>
            Keep it
          </Button>
        </div>
      ) : (
        <div className="flex flex-wrap gap-2">
          <Button
            disabled={busy}
            onClick={() => onClose('finish')}
            aria-label={`${JAR_ACTION_NAMES.finish}: jar ${jar.code} of ${jar.productName}`}
          >
            {JAR_ACTION_NAMES.finish}
          </Button>
          <Button
            variant="secondary"
            disabled={busy}
            onClick={() => setConfirmDiscard(true)}
            aria-label={`Discard jar ${jar.code} of ${jar.productName}`}
          >
            Discard
          </Button>
        </div>
      )}
    </li>
  );
}
