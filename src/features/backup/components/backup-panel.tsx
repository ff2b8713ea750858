import { useId, useState, type ChangeEvent } from 'react';
import { Link } from 'react-router-dom';
import { BACKUP_MAX_BYTES } from '@shared/choices';
import { Notice } from '@/components/ui/notice';
import { useImportHousehold } from '../api/import-household';
import { paths } from '@shared/paths';

const buttonLook = 'inline-flex min-h-11 items-center justify-center gap-2 rounded-lg px-4 font-bold transition-colors';

/** A keeper's download of the whole household, and the upload that makes a new household from one. */
export function BackupPanel({ hid }: { hid: string }) {
  const fileId = useId();
  const importing = useImportHousehold();
  const [problem, setProblem] = useState<string | null>(null);

  async function choose(event: ChangeEvent<HTMLInputElement>) {
    const file = event.target.files?.[0];
    event.target.value = '';
    setProblem(null);
    importing.reset();
    if (!file) return;
    if (file.size > BACKUP_MAX_BYTES)
      return setProblem('That file is larger than 10 MB, so it cannot be a Larderly backup.');
    let backup: unknown;
    try {
      backup = JSON.parse(await file.text());
    } catch {
      return setProblem(
        'That file is not a Larderly backup: it is not JSON. Choose the .json file the export gave you.',
      );
    }
    importing.mutate(backup);
  }

  const result = importing.data;
  const error = problem ?? (importing.error ? importing.error.message : null);
  return (
    <div className="flex flex-col gap-4">
      <div>
        <h3 className="font-bold">Export</h3>
        <p className="mb-2 text-ink-muted">
          One JSON file with the products, recipes, batches, jars and their history, meals, the planned weeks and the
          to-dos. It holds no passwords, members or invitation links. Photos and label codes are not in it.
        </p>
        <a
          href={`/api/households/${hid}/backup`}
          download
          className={`${buttonLook} border border-line bg-surface text-ink hover:bg-sunken`}
        >
          Download a backup
        </a>
      </div>
      <div>
        <h3 className="font-bold">Import</h3>
        <p className="mb-2 text-ink-muted">
          A backup becomes a new household with you as its keeper, next to this one; nothing here changes. Invite the
          others again from there.
        </p>
        <label
          htmlFor={fileId}
          className={`${buttonLook} cursor-pointer border border-line bg-surface text-ink hover:bg-sunken has-[:focus-visible]:outline-2 has-[:focus-visible]:outline-action`}
        >
          {importing.isPending ? 'Importing…' : 'Choose a backup file'}
          <input
            id={fileId}
            type="file"
            accept="application/json,.json"
            className="sr-only"
            onChange={choose}
            disabled={importing.isPending}
          />
        </label>
      </div>
      {error && (
        <Notice tone="past" role="alert" title="Nothing was imported">
          {error}
        </Notice>
      )}
      {result && (
        <Notice tone="action" role="status" title={`Imported as a new household: ${result.household.name}`}>
          <p>
            {result.counts.products} products, {result.counts.batches} batches, {result.counts.jars} jars,{' '}
            {result.counts.meals} meals and {result.counts.todos} to-dos. New jars have new label codes: print fresh
            labels from each batch.
          </p>
          <Link to={paths.today(result.household.id)} className="font-bold text-action underline underline-offset-4">
            Open {result.household.name}
          </Link>
        </Notice>
      )}
    </div>
  );
}
