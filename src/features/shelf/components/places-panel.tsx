import { useState, type FormEvent } from 'react';
import type { PlaceView } from '@shared/schemas/places';
import { count } from '@shared/words';
import { PLACE_WORDS } from '@shared/words/shelf-places';
import { Button } from '@/components/ui/button';
import { SelectField, TextField } from '@/components/ui/field';
import { Notice } from '@/components/ui/notice';
import { ApiError } from '@/lib/api-client';
import { usePlaces } from '../api/get-places';
import { useRemovePlace } from '../api/remove-place';
import { useSavePlace } from '../api/save-place';

/** The household's shelf places: everyone sees them and how many jars each holds; keepers and cooks name them. */
export function PlacesPanel({ hid, canCook }: { hid: string; canCook: boolean }) {
  const places = usePlaces(hid);
  if (places.error)
    return (
      <Notice tone="past" role="alert" title="The places could not load.">
        {places.error.message}
      </Notice>
    );
  if (!places.data) return <p className="text-ink-muted">Loading…</p>;
  return (
    <div className="flex flex-col gap-4">
      {places.data.length === 0 ? (
        <p className="text-ink-muted">
          No places yet. Name where you keep jars (“Pantry”, “Cellar shelf 2”), and the shelf can say where each jar is.
        </p>
      ) : (
        <ul className="divide-y divide-line" aria-label={PLACE_WORDS.plural}>
          {places.data.map((place) => (
            <PlaceRow key={place.id} hid={hid} place={place} others={places.data} canCook={canCook} />
          ))}
        </ul>
      )}
      {canCook && <AddPlace hid={hid} />}
    </div>
  );
}

function AddPlace({ hid }: { hid: string }) {
  const save = useSavePlace(hid);
  const [name, setName] = useState('');
  const error = save.error instanceof ApiError ? save.error : null;
  function submit(event: FormEvent) {
    event.preventDefault();
    save.mutate(name, { onSuccess: () => setName('') });
  }
  return (
    <form onSubmit={submit} className="flex flex-wrap items-end gap-2" noValidate>
      <div className="min-w-48 flex-1">
        <TextField
          label="New place"
          value={name}
          maxLength={60}
          placeholder="Cellar shelf 2"
          onChange={(e) => setName(e.target.value)}
          error={error?.fields.name ?? error?.message}
        />
      </div>
      <Button type="submit" disabled={save.isPending}>
        {save.isPending ? 'Adding…' : 'Add place'}
      </Button>
    </form>
  );
}

function PlaceRow({
  hid,
  place,
  others,
  canCook,
}: {
  hid: string;
  place: PlaceView;
  others: PlaceView[];
  canCook: boolean;
}) {
  const [mode, setMode] = useState<'view' | 'rename' | 'remove'>('view');
  const [name, setName] = useState(place.name);
  const [moveTo, setMoveTo] = useState('none');
  const rename = useSavePlace(hid, place.id);
  const remove = useRemovePlace(hid, place.id);
  const renameError = rename.error instanceof ApiError ? rename.error : null;

  function submitRename(event: FormEvent) {
    event.preventDefault();
    rename.mutate(name, { onSuccess: () => setMode('view') });
  }

  return (
    <li className="flex flex-col gap-2 py-3">
      {mode === 'rename' ? (
        <form onSubmit={submitRename} className="flex flex-wrap items-end gap-2" noValidate>
          <div className="min-w-48 flex-1">
            <TextField
              label={`Rename ${place.name}`}
              value={name}
              maxLength={60}
              autoFocus
              onChange={(e) => setName(e.target.value)}
              error={renameError?.fields.name ?? renameError?.message}
            />
          </div>
          <Button type="submit" disabled={rename.isPending}>
            Save
          </Button>
          <Button variant="quiet" onClick={() => setMode('view')}>
            Cancel
          </Button>
        </form>
      ) : (
        <div className="flex flex-wrap items-center justify-between gap-2">
          <span>
            <span className="font-bold">{place.name}</span>{' '}
            <span className="tabular text-ink-muted">{count(place.sealedJars, 'sealed jar')}</span>
          </span>
          {canCook && mode === 'view' && (
            <span className="flex gap-1">
              <Button variant="quiet" aria-label={`Rename ${place.name}`} onClick={() => setMode('rename')}>
                Rename
              </Button>
              <Button
                variant="quiet"
                aria-label={`Remove ${place.name}`}
                onClick={() => (place.sealedJars > 0 ? setMode('remove') : remove.mutate(undefined))}
                disabled={remove.isPending}
              >
                Remove
              </Button>
            </span>
          )}
        </div>
      )}
      {mode === 'remove' && (
        <div className="flex flex-col gap-2 rounded-card border border-soon-fill bg-soon-soft p-3">
          <p>
            {place.name} holds {count(place.sealedJars, 'sealed jar')}. Where should{' '}
            {place.sealedJars === 1 ? 'it' : 'they'} go?
          </p>
          <SelectField label={PLACE_WORDS.moveTo} value={moveTo} onChange={(e) => setMoveTo(e.target.value)}>
            <option value="none">{PLACE_WORDS.none}</option>
            {others
              .filter((other) => other.id !== place.id)
              .map((other) => (
                <option key={other.id} value={other.id}>
                  {other.name}
                </option>
              ))}
          </SelectField>
          <div className="flex flex-wrap gap-2">
            <Button variant="danger" disabled={remove.isPending} onClick={() => remove.mutate(moveTo)}>
              Move the jars and remove {place.name}
            </Button>
            <Button variant="quiet" onClick={() => setMode('view')}>
              Keep it
            </Button>
          </div>
        </div>
      )}
      {remove.error && (
        <p role="alert" className="font-bold text-past">
          {remove.error.message}
        </p>
      )}
    </li>
  );
}
