import { TODO_FILTERS, type TodoFilter } from '@shared/choices';

const FILTER_NAMES: Record<TodoFilter, string> = { open: 'Open', mine: 'Mine', done: 'Done', all: 'All' };

export function TodoFilters({ filter, onChange }: { filter: TodoFilter; onChange: (filter: TodoFilter) => void }) {
  return (
    <div role="group" aria-label="Show" className="inline-flex rounded-lg border border-line bg-surface p-1">
      {TODO_FILTERS.map((option) => (
        <button
          key={option}
          type="button"
          aria-pressed={filter === option}
          onClick={() => onChange(option)}
          className={`min-h-11 min-w-16 rounded-md px-3 font-bold ${filter === option ? 'bg-action text-white' : 'text-ink hover:bg-sunken'}`}
        >
          {FILTER_NAMES[option]}
        </button>
      ))}
    </div>
  );
}
