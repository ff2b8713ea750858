import { useState, type FormEvent } from 'react';
import type { MealTimes } from '@shared/schemas/calendar';
import { SLOT_NAMES } from '@shared/words';
import { Button } from '@/components/ui/button';
import { TextField } from '@/components/ui/field';
import { Notice } from '@/components/ui/notice';
import { ApiError } from '@/lib/api-client';
import { useCalendarFeed, useRenewCalendarFeed, useSetMealTimes, useTurnOffCalendarFeed } from '../api/calendar-feed';

const SLOTS = ['breakfast', 'lunch', 'snack', 'dinner'] as const;

const when = (iso: string) => new Date(iso).toLocaleString(undefined, { dateStyle: 'medium', timeStyle: 'short' });

/** A person's private calendar address for the household, and (for a keeper) the times meals are placed at. */
export function CalendarPanel({ hid, canManage }: { hid: string; canManage: boolean }) {
  const feed = useCalendarFeed(hid);
  const renew = useRenewCalendarFeed(hid);
  const turnOff = useTurnOffCalendarFeed(hid);
  const [copied, setCopied] = useState(false);
  const address = renew.data?.address;
  const problem = renew.error ?? turnOff.error;

  if (!feed.data) return <p className="text-ink-muted">{feed.error ? feed.error.message : 'Loading…'}</p>;

  async function copy() {
    if (!address) return;
    await navigator.clipboard?.writeText(address).catch(() => undefined);
    setCopied(true);
  }

  return (
    <div className="flex flex-col gap-4">
      {problem && (
        <Notice tone="past" role="alert">
          {problem.message}
        </Notice>
      )}
      {address && feed.data.on && (
        <div className="flex flex-col gap-2">
          <TextField label="Your calendar address" readOnly value={address} onFocus={(e) => e.currentTarget.select()} />
          <div className="flex flex-wrap gap-2">
            <Button onClick={copy}>{copied ? 'Copied' : 'Copy the address'}</Button>
          </div>
          <Notice tone="soon" title="Copy it now">
            Add it in your calendar app as a subscription from an address (a URL). Larderly keeps only a fingerprint of
            it and cannot show it again. Anyone with the address can read this calendar: if it was shared by mistake,
            renew it.
          </Notice>
        </div>
      )}
      {feed.data.on ? (
        <>
          {!address && (
            <p>
              Your calendar address is on since {when(feed.data.createdAt!)}.{' '}
              {feed.data.lastFetchedAt
                ? `A calendar app last read it ${when(feed.data.lastFetchedAt)}.`
                : 'No calendar app has read it yet.'}
            </p>
          )}
          <div className="flex flex-wrap gap-2">
            <Button
              variant="secondary"
              disabled={renew.isPending}
              onClick={() => {
                if (
                  window.confirm(
                    'Make a new address? The old one stops working at once, in every calendar app that uses it.',
                  )
                )
                  renew.mutate();
              }}
            >
              Renew the address
            </Button>
            <Button
              variant="quiet"
              disabled={turnOff.isPending}
              onClick={() => turnOff.mutate(undefined, { onSuccess: () => renew.reset() })}
            >
              Turn off
            </Button>
          </div>
        </>
      ) : (
        <div>
          <Button disabled={renew.isPending} onClick={() => renew.mutate()}>
            Turn on my calendar address
          </Button>
        </div>
      )}
      <MealTimesForm
        key={JSON.stringify(feed.data.mealTimes)}
        hid={hid}
        times={feed.data.mealTimes}
        canEdit={canManage}
      />
    </div>
  );
}

function MealTimesForm({ hid, times, canEdit }: { hid: string; times: MealTimes; canEdit: boolean }) {
  const save = useSetMealTimes(hid);
  const [form, setForm] = useState<MealTimes>(times);
  const error = save.error instanceof ApiError ? save.error : null;

  function submit(event: FormEvent) {
    event.preventDefault();
    save.mutate(form);
  }

  return (
    <form onSubmit={submit} className="flex flex-col gap-3" noValidate>
      <h3 className="font-bold">Meal times</h3>
      <p className="text-sm text-ink-muted">
        The calendar places each planned meal at its time, in the household’s time zone.
        {canEdit ? '' : ' A keeper sets them.'}
      </p>
      <div className="grid grid-cols-2 gap-3 sm:grid-cols-4">
        {SLOTS.map((slot) => (
          <TextField
            key={slot}
            label={SLOT_NAMES[slot]}
            type="time"
            value={form[slot]}
            disabled={!canEdit}
            error={error?.fields[slot]}
            onChange={(e) => setForm({ ...form, [slot]: e.target.value })}
          />
        ))}
      </div>
      {canEdit && (
        <div className="flex items-center gap-3">
          <Button type="submit" variant="secondary" disabled={save.isPending}>
            Save the meal times
          </Button>
          {save.isSuccess && <span role="status">Saved.</span>}
          {error && !Object.keys(error.fields).length && <span role="alert">{error.message}</span>}
        </div>
      )}
    </form>
  );
}
