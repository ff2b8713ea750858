import type { JarAction, JarView } from '@shared/schemas/batches';
import { JAR_ACTION_NAMES } from '@shared/words';
import { STOCK_WORDS } from '@shared/words/stock';
import { Button } from '@/components/ui/button';
import { CheckboxField } from '@/components/ui/field';
import { Notice } from '@/components/ui/notice';
import { useState } from 'react';
import { useActOnJar } from '../api/act-on-jar';
import { GiveJar } from './give-jar';
import { OpenJarButton, OpeningChecks, type OpenableJar } from './open-jar';

const ACTIONS: Record<JarView['state'], { action: JarAction; label: string }[]> = {
  sealed: [
    { action: 'open', label: JAR_ACTION_NAMES.open },
    { action: 'discard', label: JAR_ACTION_NAMES.discard },
  ],
  opened: [
    { action: 'finish', label: JAR_ACTION_NAMES.finish },
    { action: 'discard', label: JAR_ACTION_NAMES.discard },
  ],
  finished: [],
  discarded: [],
  given: [],
};

/** What any member may do with a jar (a sealed one may also be given away); a 409 says someone else got there first. */
export function JarActions({ hid, jar, size = 'normal' }: { hid: string; jar: JarView; size?: 'normal' | 'large' }) {
  const act = useActOnJar(hid);
  const [justOpened, setJustOpened] = useState<OpenableJar | null>(null);
  const [confirmDiscard, setConfirmDiscard] = useState(false);
  const [kept, setKept] = useState(true);
  const choices = ACTIONS[jar.state];
  if (choices.length === 0) return null;
  return (
    <div className="flex flex-col gap-2">
      <div className="flex flex-wrap gap-2">
        {choices.map(({ action, label }) =>
          action === 'open' ? (
            <OpenJarButton
              key={action}
              hid={hid}
              jar={jar}
              label={label}
              ariaLabel={`${label}: jar ${jar.code}`}
              className={size === 'large' ? 'min-h-14 px-6 text-lg' : ''}
              onOpened={setJustOpened}
            />
          ) : (
            <Button
              key={action}
              variant={action === 'discard' && size === 'large' ? 'danger' : 'secondary'}
              className={`${size === 'large' ? 'min-h-14 px-6 text-lg' : ''} ${action === 'discard' && size !== 'large' ? 'text-past' : ''}`}
              disabled={act.isSending}
              aria-label={`${label}: jar ${jar.code}`}
              onClick={() => (action === 'discard' ? setConfirmDiscard(true) : act.act(jar, action))}
            >
              {label}
            </Button>
          ),
        )}
        {jar.state === 'sealed' && jar.seal === 'checked' && <GiveJar hid={hid} jar={jar} size={size} />}
      </div>
      {confirmDiscard && (
        <div
          className="flex flex-col gap-3 rounded-lg border border-line bg-sunken p-3"
          role="group"
          aria-label={`Discard jar ${jar.code}?`}
        >
          <p className="font-bold">
            Discard jar {jar.code} of {jar.productName}? When in doubt, throw it out.
          </p>
          <CheckboxField
            label={STOCK_WORDS.kept}
            hint={STOCK_WORDS.keptHint}
            checked={kept}
            onChange={(e) => setKept(e.target.checked)}
          />
          <div className="flex flex-wrap gap-2">
            <Button
              variant="danger"
              disabled={act.isSending}
              onClick={() => act.act(jar, 'discard', { kept, onSuccess: () => setConfirmDiscard(false) })}
            >
              Yes, discard
            </Button>
            <Button variant="secondary" onClick={() => setConfirmDiscard(false)}>
              Not now
            </Button>
          </div>
        </div>
      )}
      {justOpened && <OpeningChecks code={justOpened.code} productName={justOpened.productName} />}
      {act.error && (
        <Notice tone="past" role="alert">
          {act.error.message}
        </Notice>
      )}
    </div>
  );
}
