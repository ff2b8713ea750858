import { onlineManager } from '@tanstack/react-query';
import { useEffect, useRef, useState } from 'react';
import { Link } from 'react-router-dom';
import type { JarView, OpeningAdvice } from '@shared/schemas/batches';
import { dateWords, OPENING_CHECKS, OPENING_CHECKS_SOURCE } from '@shared/words';
import { placeWords } from '@shared/words/shelf-places';
import { Button } from '@/components/ui/button';
import { Notice } from '@/components/ui/notice';
import { useActOnJar } from '../api/act-on-jar';
import { getOpeningAdvice } from '../api/get-opening-advice';
import { paths } from '@shared/paths';

export type OpenableJar = Pick<JarView, 'id' | 'code' | 'productName'>;

interface Props {
  hid: string;
  jar: OpenableJar;
  label: string;
  ariaLabel?: string;
  variant?: 'primary' | 'secondary';
  className?: string;
  /** The jar actually opened (it may be the better one offered); the caller shows the checks, since this button may go away. */
  onOpened: (jar: OpenableJar) => void;
}

/**
 * Opens a jar, first asking the server whether the same product has a jar that should go first (one already open,
 * or an older sealed one); if so it says which and offers it, but the person may still open this one.
 */
export function OpenJarButton({ hid, jar, label, ariaLabel, variant = 'primary', className = '', onOpened }: Props) {
  const act = useActOnJar(hid);
  const [advice, setAdvice] = useState<OpeningAdvice | null>(null);
  const [checking, setChecking] = useState(false);

  function open(which: OpenableJar) {
    setAdvice(null);
    // Offline the change waits for the network, but what to check before eating is shown at once.
    if (!onlineManager.isOnline()) {
      act.act(which, 'open');
      onOpened(which);
    } else act.act(which, 'open', { onSuccess: () => onOpened(which) });
  }

  async function start() {
    setChecking(true);
    try {
      const found = await getOpeningAdvice(hid, jar.id);
      if (found.openedJars.length || found.olderSealed.length) setAdvice(found);
      else open(jar);
    } catch {
      // Advice is a help, not a gate: if it cannot be had, the jar still opens.
      open(jar);
    } finally {
      setChecking(false);
    }
  }

  return (
    <div className="flex flex-col gap-2">
      {!advice && (
        <Button
          variant={variant}
          className={className}
          disabled={checking || act.isSending}
          aria-label={ariaLabel}
          onClick={() => void start()}
        >
          {label}
        </Button>
      )}
      {advice && <AdvicePanel jar={jar} advice={advice} onOpen={open} onCancel={() => setAdvice(null)} />}
      {act.error && (
        <Notice tone="past" role="alert">
          {act.error.message}
        </Notice>
      )}
    </div>
  );
}

function AdvicePanel({
  jar,
  advice,
  onOpen,
  onCancel,
}: {
  jar: OpenableJar;
  advice: OpeningAdvice;
  onOpen: (jar: OpenableJar) => void;
  onCancel: () => void;
}) {
  const heading = useRef<HTMLHeadingElement>(null);
  useEffect(() => heading.current?.focus(), []);
  const oldest = advice.olderSealed[0];
  return (
    <section
      aria-labelledby={`advice-${jar.id}`}
      className="flex flex-col gap-3 rounded-card border border-soon-fill bg-soon-soft p-4 text-ink"
    >
      <h3 id={`advice-${jar.id}`} ref={heading} tabIndex={-1} className="text-lg font-bold">
        {advice.openedJars.length
          ? `${jar.productName} already has an opened jar`
          : `An older jar of ${jar.productName} is on the shelf`}
      </h3>
      {advice.openedJars.length > 0 && (
        <div>
          <p>Finish the opened one first, so neither passes its use-by:</p>
          <ul className="mt-1 flex flex-col gap-1">
            {advice.openedJars.map((other) => (
              <li key={other.id}>
                <Link
                  to={paths.jar(other.code)}
                  className="inline-flex min-h-11 items-center font-bold text-action underline underline-offset-4"
                >
                  Jar {other.code}
                </Link>{' '}
                opened {other.openedOn ? dateWords(other.openedOn) : ''}
                {other.useBy ? `, use by ${dateWords(other.useBy)}` : ''}
              </li>
            ))}
          </ul>
        </div>
      )}
      {oldest && (
        <p>
          Jar {oldest.code} was canned {dateWords(oldest.cannedOn)}
          {oldest.pastBestQuality ? ', and is past its best quality' : ''}
          {oldest.placeName ? `; it is ${placeWords(oldest.placeName)}` : ''}: the oldest is the one to eat first
          {advice.olderSealed.length > 1 ? ` (${advice.olderSealed.length} older jars in all)` : ''}.
        </p>
      )}
      <div className="flex flex-wrap gap-2">
        {oldest && <Button onClick={() => onOpen(oldest)}>Open jar {oldest.code} instead</Button>}
        <Button variant="secondary" onClick={() => onOpen(jar)}>
          Open jar {jar.code} anyway
        </Button>
        <Button variant="quiet" onClick={onCancel}>
          Not now
        </Button>
      </div>
    </section>
  );
}

/** What to check the moment a home-canned jar is opened; shown every time, because spoilage is not always visible. */
export function OpeningChecks({ code, productName }: { code: string; productName: string }) {
  return (
    <Notice tone="info" title={`Jar ${code} of ${productName} is open. Before you eat from it:`} role="status">
      <ul className="list-disc pl-5">
        {OPENING_CHECKS.map((check) => (
          <li key={check}>{check}</li>
        ))}
      </ul>
      <p className="mt-1 text-sm text-ink-muted">Advice of the {OPENING_CHECKS_SOURCE}.</p>
    </Notice>
  );
}
