import { useDraggable } from '@dnd-kit/core';
import Fuse from 'fuse.js';
import { useMemo, useState, type FormEvent } from 'react';
import type { MealView } from '@shared/schemas/week';
import { useCreateMeal } from '../api/create-meal';

function MealChip({ meal, canEdit }: { meal: MealView; canEdit: boolean }) {
  const { attributes, listeners, setNodeRef, isDragging } = useDraggable({ id: `meal:${meal.id}`, data: { type: 'meal', meal }, disabled: !canEdit });
  return (
    <li className="w-44 shrink-0 md:w-auto">
      <button
        type="button"
        ref={setNodeRef}
        {...attributes}
        {...listeners}
        className={`flex h-full min-h-11 w-full touch-manipulation select-none flex-col items-start rounded-lg border border-line bg-surface px-3 py-1 text-left hover:border-action ${canEdit ? 'cursor-grab' : 'cursor-default'} ${isDragging ? 'opacity-40' : ''}`}
      >
        <span className="font-bold leading-snug">{meal.name}</span>
        <span className="text-xs text-ink-muted">{[...meal.tags, `serves ${meal.usualServings}`].join(' · ')}</span>
      </button>
    </li>
  );
}

/** The household's meals, searched loosely by name and tag, each one draggable onto the week. */
export function MealLibrary({ hid, meals, canEdit }: { hid: string; meals: MealView[]; canEdit: boolean }) {
  const [search, setSearch] = useState('');
  const fuse = useMemo(() => new Fuse(meals, { keys: ['name', 'tags'], threshold: 0.4, ignoreLocation: true }), [meals]);
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
        <p className="text-sm text-ink-muted">No meals yet. {canEdit ? 'Add the ones your household makes, then drag them onto the week.' : 'A cook adds them.'}</p>
      ) : shown.length === 0 ? (
        <p className="text-sm text-ink-muted">No meal matches “{search}”.</p>
      ) : (
        <ul className="-mx-1 flex gap-1.5 overflow-x-auto px-1 pb-1 md:mx-0 md:grid md:max-h-72 md:grid-cols-[repeat(auto-fill,minmax(11rem,1fr))] md:overflow-x-visible md:overflow-y-auto md:px-0 md:pr-1">
          {shown.map((meal) => (
            <MealChip key={meal.id} meal={meal} canEdit={canEdit} />
          ))}
        </ul>
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
      <input aria-label="New meal name" placeholder="New meal" value={name} maxLength={100} onChange={(e) => setName(e.target.value)} className="min-h-11 min-w-0 flex-1 rounded-lg border border-line bg-surface px-3" />
      <button type="submit" disabled={create.isPending || !name.trim()} className="min-h-11 rounded-lg border border-line bg-surface px-3 font-bold text-action hover:bg-action-soft disabled:text-ink-muted">
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
