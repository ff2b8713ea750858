import { useState, type FormEvent } from 'react';
import type { BatchDetail, SealCheckDone } from '@shared/schemas/batches';
import { clockWords, count, SEAL_CHECK_HOW, SEAL_CHECK_SOURCE, UNSEALED_CHOICES } from '@shared/words';
import { STOCK_WORDS } from '@shared/words/stock';
import { Button } from '@/components/ui/button';
import { CautionLine } from '@/components/ui/caution-line';
import { ChoiceCard, TextField } from '@/components/ui/field';
import { Notice } from '@/components/ui/notice';
import { ApiError } from '@/lib/api-client';
import { useCheckSeals } from '../api/check-seals';
import { numberFrom } from '../number-from';
import { sealCheckTimes } from '../seal-check-times';
import { PlanPanel } from './plan-panel';

/** The seal check on the batch page: by count or jar by jar, then the fridge or a reprocess for the jars that did not seal. */
export function SealCheckPanel({ hid, batch, canCook }: { hid: string; batch: BatchDetail; canCook: boolean }) {
  const check = batch.sealCheck;
  const save = useCheckSeals(hid, batch.id);
  const [byJar, setByJar] = useState(false);
  const [countText, setCountText] = useState('0');
  const [picked, setPicked] = useState<string[]>([]);
  const [way, setWay] = useState<'fridge' | 'reprocess'>('fridge');
  const [done, setDone] = useState<SealCheckDone | null>(null);
  const error = save.error instanceof ApiError ? save.error : null;

  const outcome = done && <SealCheckOutcome done={done} batch={batch} />;
  if (!check) return outcome;
  const { ready, reprocessOpen } = sealCheckTimes(check);
  const timeZone = check.timeZone;
  const jars = batch.jars.filter((jar) => check.jarIds.includes(jar.id));
  const unsealed = byJar ? picked.length : numberFrom(countText);
  const wayNow = reprocessOpen && canCook ? way : 'fridge';

  function submit(event: FormEvent) {
    event.preventDefault();
    if (!Number.isInteger(unsealed) || unsealed < 0) return;
    const pick = byJar ? { jarIds: picked } : { count: unsealed };
    save.mutate(wayNow === 'fridge' ? { fridge: pick } : { reprocess: pick }, {
      onSuccess: (result) => {
        setDone(result);
        setPicked([]);
        setCountText('0');
      },
    });
  }

  return (
    <>
      {outcome}
      <section aria-labelledby="seal-check-heading" className="rounded-card border-2 border-soon-fill bg-surface p-4">
        <h2 id="seal-check-heading" className="text-xl">
          {check.processingNumber > 1 ? 'Check the reprocessed seals' : 'Check the seals'}
        </h2>
        <p className="mt-1 text-[0.95rem]">
          {count(jars.length, 'jar')} came out of the canner {clockWords(check.processedAt, timeZone)}.{' '}
          {ready
            ? 'They have cooled 12 hours: check them now.'
            : `Leave them undisturbed until ${clockWords(check.checkFrom, timeZone)}.`}
        </p>
        <p className="mt-2 text-[0.95rem]">{SEAL_CHECK_HOW}</p>
        <p className="mt-1 text-sm text-ink-muted">Source: {SEAL_CHECK_SOURCE}.</p>
        {ready && (
          <form onSubmit={submit} noValidate className="mt-3 flex flex-col gap-3">
            <div role="group" aria-label="How to mark" className="flex gap-2">
              <Button variant={byJar ? 'secondary' : 'primary'} aria-pressed={!byJar} onClick={() => setByJar(false)}>
                By count
              </Button>
              <Button variant={byJar ? 'primary' : 'secondary'} aria-pressed={byJar} onClick={() => setByJar(true)}>
                Jar by jar
              </Button>
            </div>
            {byJar ? (
              <fieldset className="flex flex-col gap-1">
                <legend className="mb-1 font-bold">Which jars did not seal?</legend>
                {jars.map((jar) => (
                  <label key={jar.id} className="flex min-h-11 items-center gap-3">
                    <input
                      type="checkbox"
                      className="size-6 shrink-0 accent-action"
                      checked={picked.includes(jar.id)}
                      onChange={(e) =>
                        setPicked(e.target.checked ? [...picked, jar.id] : picked.filter((id) => id !== jar.id))
                      }
                    />
                    <span className="font-mono text-lg font-bold tracking-wider">{jar.code}</span>
                  </label>
                ))}
              </fieldset>
            ) : (
              <TextField
                label="Jars that did not seal"
                inputMode="numeric"
                value={countText}
                onChange={(e) => setCountText(e.target.value)}
                error={error?.fields['fridge.count'] ?? error?.fields['reprocess.count']}
                hint={`Of ${count(jars.length, 'jar')}; 0 when every lid sealed.`}
              />
            )}
            {unsealed > 0 && (
              <fieldset className="flex flex-col gap-2">
                <legend className="mb-1 font-bold">Where do they go?</legend>
                <ChoiceCard
                  name="unsealed-way"
                  checked={wayNow === 'fridge'}
                  onChange={() => setWay('fridge')}
                  label={UNSEALED_CHOICES.fridge}
                />
                {reprocessOpen && canCook ? (
                  <ChoiceCard
                    name="unsealed-way"
                    checked={wayNow === 'reprocess'}
                    onChange={() => setWay('reprocess')}
                    label={`${UNSEALED_CHOICES.reprocess} Until ${clockWords(check.reprocessUntil!, timeZone)}.`}
                  />
                ) : (
                  <p className="text-sm text-ink-muted">
                    {reprocessOpen ? 'Reprocessing is recorded by a cook or a keeper.' : UNSEALED_CHOICES.tooLate}
                  </p>
                )}
              </fieldset>
            )}
            {error && (
              <Notice tone="past" role="alert">
                {error.message}
              </Notice>
            )}
            <div>
              <Button type="submit" disabled={save.isPending || !Number.isInteger(unsealed)}>
                {save.isPending
                  ? 'Saving…'
                  : unsealed > 0
                    ? wayNow === 'fridge'
                      ? `Put ${count(unsealed, 'jar')} in the fridge`
                      : `Reprocess ${count(unsealed, 'jar')}`
                    : `All ${jars.length} sealed`}
              </Button>
            </div>
          </form>
        )}
        <div className="mt-3">
          <CautionLine about="canning" />
        </div>
      </section>
    </>
  );
}

function SealCheckOutcome({ done, batch }: { done: SealCheckDone; batch: BatchDetail }) {
  return (
    <div className="flex flex-col gap-3">
      <Notice tone="action" role="status" title="Seal check saved">
        {count(done.sealed, 'jar')} sealed{done.toFridge ? `, ${count(done.toFridge, 'jar')} in the fridge` : ''}
        {done.reprocessed
          ? `, ${count(done.reprocessed, 'jar')} to reprocess with new lids and the full time below`
          : ''}
        .
      </Notice>
      {done.stockWarnings.length > 0 && (
        <Notice tone="soon" title={STOCK_WORDS.newLids}>
          {done.stockWarnings.join(' ')}
        </Notice>
      )}
      {done.plan && <PlanPanel plan={done.plan} method={batch.method} altitudeFt={batch.altitudeFt} />}
    </div>
  );
}
