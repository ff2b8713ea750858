import { useState } from 'react';
import type { JarView } from '@shared/schemas/batches';
import { count } from '@shared/words';
import { PLACE_WORDS, placeWords } from '@shared/words/shelf-places';
import { Button } from '@/components/ui/button';
import { SelectField } from '@/components/ui/field';
import { useMoveJars } from '../api/move-jars';
import { usePlaces } from '../api/get-places';

/** Only sealed jars have a shelf place: an opened jar lives in the fridge. */
const onShelf = (jar: JarView) => jar.state === 'sealed';

/** Where a jar is kept and, for a jar on hand, a way to move it; the move goes into the jar's history. */
export function MoveJar({ hid, jar, canMove }: { hid: string; jar: JarView; canMove: boolean }) {
  if (!onShelf(jar)) return null;
  return (
    <div className="flex flex-col gap-2">
      <p className="text-lg">
        <span className="font-bold">{PLACE_WORDS.name}:</span> {jar.placeName ?? PLACE_WORDS.noneOnShelf}
      </p>
      {canMove && <MoveJarsForm hid={hid} jars={[jar]} buttonLabel={`Move jar ${jar.code}`} />}
    </div>
  );
}

/** A place to choose and a button: moves the given jars on hand there, together. */
export function MoveJarsForm({ hid, jars, buttonLabel }: { hid: string; jars: JarView[]; buttonLabel: string }) {
  const places = usePlaces(hid);
  const move = useMoveJars(hid);
  const movable = jars.filter(onShelf);
  const shared = movable.every((jar) => jar.placeId === movable[0]?.placeId) ? movable[0]?.placeId : undefined;
  const [to, setTo] = useState(shared ?? 'none');
  const choices = places.data ?? [];
  if (movable.length === 0 || choices.length === 0) return null;
  const allThere = movable.every((jar) => (jar.placeId ?? 'none') === to);
  return (
    <div className="flex flex-col gap-2">
      <div className="flex flex-wrap items-end gap-2">
        <div className="min-w-48 flex-1">
          <SelectField
            label={
              jars.length > 1 ? `${PLACE_WORDS.moveTo} (${count(movable.length, 'sealed jar')})` : PLACE_WORDS.moveTo
            }
            value={to}
            onChange={(e) => setTo(e.target.value)}
          >
            <option value="none">{PLACE_WORDS.none}</option>
            {choices.map((place) => (
              <option key={place.id} value={place.id}>
                {place.name}
              </option>
            ))}
          </SelectField>
        </div>
        <Button
          variant="secondary"
          disabled={move.isPending || allThere}
          onClick={() => move.mutate({ jarIds: movable.map((jar) => jar.id), placeId: to === 'none' ? null : to })}
        >
          {move.isPending ? 'Moving…' : buttonLabel}
        </Button>
      </div>
      {move.isSuccess && !move.isPending && (
        <p role="status" className="text-ink-muted">
          {move.data.moved === 1 ? '1 jar is' : `${move.data.moved} jars are`} {placeWords(move.data.placeName)} now.
        </p>
      )}
      {move.error && (
        <p role="alert" className="font-bold text-past">
          {move.error.message}
        </p>
      )}
    </div>
  );
}
