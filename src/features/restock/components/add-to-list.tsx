import { useState, type FormEvent } from 'react';
import { Link } from 'react-router-dom';
import type { JarSize } from '@shared/domain';
import { Button } from '@/components/ui/button';
import { ErrorWithAction } from '@/components/ui/error-with-action';
import { useAddRestockTodo } from '../api/add-restock-todo';
import { paths } from '@shared/paths';
import { useUnits } from '@/lib/units';

/** "Add a restock batch to the to-do list", with the jar count the cook may change. */

export function AddToList({
  hid,
  productId,
  productName,
  suggestedJars,
  jarSize,
}: {
  hid: string;
  productId: string;
  productName: string;
  suggestedJars: number;
  jarSize: JarSize;
}) {
  const units = useUnits();
  const add = useAddRestockTodo(hid);
  const [jars, setJars] = useState(String(suggestedJars));
  const submit = (event: FormEvent) => {
    event.preventDefault();
    add.mutate({ productId, input: { jars: Number(jars), jarSize } });
  };
  if (add.isSuccess) {
    return (
      <p role="status" className="font-bold">
        On the list.{' '}
        <Link to={paths.todo(hid, add.data.id)} className="text-action underline">
          Open the batch plan
        </Link>
      </p>
    );
  }
  return (
    <form onSubmit={submit} className="flex flex-wrap items-end gap-3">
      <label className="flex flex-col gap-1">
        <span className="text-sm font-bold">{units.jarSize(jarSize)} jars</span>
        <input
          type="number"
          inputMode="numeric"
          min={1}
          max={200}
          required
          value={jars}
          onChange={(event) => setJars(event.target.value)}
          aria-label={`Jars of ${productName} to make`}
          className="min-h-11 w-24 rounded-lg border border-line bg-surface px-2 text-center tabular"
        />
      </label>
      <Button type="submit" disabled={add.isPending}>
        {add.isPending ? 'Adding…' : 'Add to the to-do list'}
      </Button>
      {add.isError && (
        <div className="w-full">
          <ErrorWithAction error={add.error} />
        </div>
      )}
    </form>
  );
}
