import { useState } from 'react';
import type { JarView } from '@shared/schemas/batches';
import { GIFT_WORDS } from '@shared/words/gifts';
import { Button } from '@/components/ui/button';
import { TextField } from '@/components/ui/field';
import { Notice } from '@/components/ui/notice';
import { ApiError } from '@/lib/api-client';
import { useGiveJar } from '../api/give-jar';

/** "Give away" on a sealed jar: one optional line for whom, then the jar leaves the shelf (and can be undone). */
export function GiveJar({
  hid,
  jar,
  size = 'normal',
  label = GIFT_WORDS.action,
}: {
  hid: string;
  jar: Pick<JarView, 'id' | 'code'>;
  size?: 'normal' | 'large';
  /** The button's words; the shelf names which jar goes. */
  label?: string;
}) {
  const give = useGiveJar(hid);
  const [asking, setAsking] = useState(false);
  const [to, setTo] = useState('');
  const big = size === 'large' ? 'min-h-14 px-6 text-lg' : '';
  const fieldError = give.error instanceof ApiError ? give.error.fields.to : undefined;
  if (!asking)
    return (
      <Button
        variant="secondary"
        className={big}
        aria-label={`${GIFT_WORDS.action}: jar ${jar.code}`}
        onClick={() => setAsking(true)}
      >
        {label}
      </Button>
    );
  return (
    <form
      className="flex w-full flex-col gap-2 rounded-card border border-line bg-sunken/50 p-3"
      aria-label={`${GIFT_WORDS.action}: jar ${jar.code}`}
      onSubmit={(event) => {
        event.preventDefault();
        give.mutate({ jarId: jar.id, to }, { onSuccess: () => setAsking(false) });
      }}
    >
      <p className="font-bold">
        {GIFT_WORDS.action}: jar {jar.code}
      </p>
      <TextField
        label={GIFT_WORDS.to}
        hint={GIFT_WORDS.toHint}
        value={to}
        maxLength={80 /* LIMITS.length.giftRecipient; the server checks it too */}
        autoComplete="off"
        error={fieldError}
        onChange={(event) => setTo(event.target.value)}
      />
      <p className="text-sm text-ink-muted">{GIFT_WORDS.why}</p>
      <div className="flex flex-wrap gap-2">
        <Button type="submit" className={big} disabled={give.isPending}>
          {GIFT_WORDS.confirm}
        </Button>
        <Button variant="quiet" className={big} onClick={() => setAsking(false)}>
          {GIFT_WORDS.cancel}
        </Button>
      </div>
      {give.error && !fieldError && (
        <Notice tone="past" role="alert">
          {give.error.message}
        </Notice>
      )}
    </form>
  );
}
