import Fuse from 'fuse.js';
import { useMemo, useState, type FormEvent, type ReactNode } from 'react';
import type { MealView } from '@shared/schemas/week';
import { useCreateMeal } from '../api/create-meal';
import { useBoardChip } from '../use-board-chip';
import { ChipList } from './chip-list';

function MealChip({ meal, putOn }: { meal: MealView; putOn: ReactNode }) {
  const { board, attributes, listeners, setNodeRef, isDragging, picked } = useBoardChip({ type: 'meal', meal });
  return (
    <>
      <button
        type="button"
        ref={setNodeRef}
        {...attributes}
        {...listeners}
        aria-pressed={board.canEdit ? picked : undefined}
        // A click from Space or Enter starts a keyboard drag instead; only a tap or a mouse click picks the meal up.
        onClick={(e) => board.canEdit && e.detail > 0 && board.hold(picked ? null : { type: 'meal', meal })}
        className={`flex min-h-11 min-w-0 flex-1 touch-manipulation select-none flex-col items-start rounded-lg border px-3 py-1 text-left hover:border-action ${board.canEdit ? 'cursor-grab' : 'cursor-default'} ${isDragging ? 'opacity-40' : ''} ${picked ? 'border-action bg-action-soft ring-2 ring-action' : 'border-line bg-surface'}`}
      >
        <span className="font-bold leading-snug">{meal.name}</span>
        <span className="text-xs text-ink-muted">
          {[...meal.tags, `serves ${meal.usualServings}`].join(' · ')}
          {picked && (
            <span aria-hidden="true" className="font-bold text-action">
              {' '}
              · Picked
            </span>
          )}
        </span>
      </button>
      {putOn}
    </>
  );
}

/** The household's meals, searched loosely by name and tag, each one draggable onto the week. */
export function MealLibrary({ hid, meals, canEdit }: { hid: string; meals: MealView[]; canEdit: boolean }) {
  const [search, setSearch] = useState('');
  const fuse = useMemo(
    () => new Fuse(meals, { keys: ['name', 'tags'], threshold: 0.4, ignoreLocation: true }),
    [meals],
  );
  const shown = search.trim() ? fuse.search(search.trim()).map((r) => r.item) : meals;
  return (
    <section aria-labelledby="meal-library" className="flex min-w-0 flex-col gap-2">
      <h2 id="meal-library" className="text-lg">
        Meals
      </h2>
      <input
        type="search"
        aria-label="Search meals"
        placeholder="Search meals or tags"
        value={search}
        onChange={(e) => setSearch(e.target.value)}
        className="min-h-11 rounded-lg border border-line bg-surface px-3"
      />
      {meals.length === 0 ? (
        <p className="text-sm text-ink-muted">
          No meals yet.{' '}
          {canEdit ? 'Add the ones your household makes, then tap or drag them onto the week.' : 'A cook adds them.'}
        </p>
      ) : shown.length === 0 ? (
        <p className="text-sm text-ink-muted">No meal matches “{search}”.</p>
      ) : (
        <ChipList
          id="meal-library"
          things={shown}
          noun="meals"
          sourceOf={(meal) => ({ type: 'meal', meal })}
          chip={(meal, putOn) => <MealChip meal={meal} putOn={putOn} />}
        />
      )}
      {canEdit && <NewMealForm hid={hid} />}
    </section>
  );
}

function NewMealForm({ hid }: { hid: string }) {
  const create = useCreateMeal(hid);
  const [name, setName] = useState('');
  const submit = (event: FormEvent) => {
    event.preventDefault();
    if (!name.trim()) return;
    create.mutate({ name: name.trim() }, { onSuccess: () => setName('') });
  };
  return (
    <form onSubmit={submit} className="flex gap-1.5">
      <input
        aria-label="New meal name"
        placeholder="New meal"
        value={name}
        maxLength={100}
        onChange={(e) => setName(e.target.value)}
        className="min-h-11 min-w-0 flex-1 rounded-lg border border-line bg-surface px-3"
      />
      <button
        type="submit"
        disabled={create.isPending || !name.trim()}
        className="min-h-11 rounded-lg border border-line bg-surface px-3 font-bold text-action hover:bg-action-soft disabled:text-ink-muted"
      >
        Add
      </button>
      {create.error && (
        <p role="alert" className="text-sm font-bold text-past">
          {create.error.message}
        </p>
      )}
    </form>
  );
}
