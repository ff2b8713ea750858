import { useState } from 'react';
import { Link } from 'react-router-dom';
import { count, DATE_NAMES, dateWords, heatWords, PRODUCT_KIND_NAMES } from '@shared/words';
import { GIFT_WORDS } from '@shared/words/gifts';
import { placeWords } from '@shared/words/shelf-places';
import type { ShelfProductGroup } from '../shelf-rows';
import { PastBestBadge } from './jar-badges';
import { ColourDot } from './colour-dot';
import { GiveJar } from './give-jar';
import { OpenJarButton, OpeningChecks, type OpenableJar } from './open-jar';
import { paths } from '@shared/paths';
import { useUnits } from '@/lib/units';

export function ShelfCards({
  hid,
  groups,
  canHandleJars,
  canCook,
  givenThisYear,
}: {
  hid: string;
  groups: ShelfProductGroup[];
  canHandleJars: boolean;
  canCook: boolean;
  /** Jars of each product given away this year, by product id. */
  givenThisYear: Map<string, number>;
}) {
  const units = useUnits();
  const [justOpened, setJustOpened] = useState<Record<string, OpenableJar>>({});
  return (
    <ul className="grid gap-4 sm:grid-cols-2 xl:grid-cols-3">
      {groups.map((group) => (
        <li
          key={group.product.id}
          className="flex min-w-0 flex-col gap-3 rounded-card border border-line bg-surface p-4"
        >
          <div className="flex items-start justify-between gap-3">
            <div className="min-w-0 flex-1">
              <h2 className="flex items-baseline gap-2 text-lg">
                <ColourDot colour={group.product.colour} />
                <span className="min-w-0 [overflow-wrap:anywhere]">{group.product.name}</span>
                {group.product.favourite && (
                  <span className="text-soon" title="A household favorite" aria-label="favorite">
                    ★
                  </span>
                )}
              </h2>
              <p className="text-sm text-ink-muted">
                {PRODUCT_KIND_NAMES[group.product.kind]}
                {group.product.heat > 0 ? ` · ${heatWords(group.product.heat)}` : ''}
              </p>
            </div>
            <p className="shrink-0 text-right">
              <span className="tabular block text-3xl font-bold leading-none">{group.sealed}</span>
              <span className="text-sm text-ink-muted">sealed</span>
            </p>
          </div>
          {group.oldestBestBy ? (
            <p className="flex flex-wrap items-center gap-2 text-[0.95rem]">
              <span className="tabular">
                {DATE_NAMES.oldestBestQuality} {dateWords(group.oldestBestBy)}
              </span>
              {group.pastBest > 0 && <PastBestBadge bestBy={group.oldestBestBy} />}
            </p>
          ) : (
            <p className="text-[0.95rem] text-ink-muted">
              None on the shelf
              {group.product.minJars > 0 ? `; the household keeps at least ${group.product.minJars}` : ''}.
            </p>
          )}
          {group.opened > 0 && <p className="text-sm text-info">{group.opened} opened in the fridge</p>}
          {(givenThisYear.get(group.product.id) ?? 0) > 0 && (
            <p className="text-sm text-ink-muted">
              {count(givenThisYear.get(group.product.id)!, 'jar')} given away this year
            </p>
          )}
          {group.batches.length > 0 && (
            <ul className="divide-y divide-line border-y border-line text-[0.95rem]">
              {group.batches.map((row) => (
                <li key={row.batchId}>
                  <Link
                    to={paths.batch(hid, row.batchId)}
                    className="flex min-h-11 items-center justify-between gap-2 hover:bg-sunken"
                  >
                    <span className="tabular">
                      {dateWords(row.cannedOn)} · {units.jarSize(row.jarSize)}
                    </span>
                    <span className="tabular font-bold">{row.sealed}</span>
                  </Link>
                </li>
              ))}
            </ul>
          )}
          {group.nextJar && (
            <p className="tabular text-sm text-ink-muted">
              Eat first: jar {group.nextJar.code}
              {group.nextJar.placeName ? `, ${placeWords(group.nextJar.placeName)}` : ''}
            </p>
          )}
          <div className="mt-auto flex flex-wrap gap-2">
            {canHandleJars && group.nextJar && (
              <OpenJarButton
                hid={hid}
                jar={{ ...group.nextJar, productName: group.product.name }}
                variant="secondary"
                label="Open oldest jar"
                ariaLabel={`Open oldest jar of ${group.product.name}`}
                onOpened={(jar) => setJustOpened((all) => ({ ...all, [group.product.id]: jar }))}
              />
            )}
            {canHandleJars && group.nextJar?.seal === 'checked' && (
              <GiveJar hid={hid} jar={group.nextJar} label={`${GIFT_WORDS.action} jar ${group.nextJar.code}`} />
            )}
            {canCook && (
              <Link
                to={paths.product(hid, group.product.id)}
                className="inline-flex min-h-11 items-center rounded-lg px-3 font-bold text-action hover:bg-action-soft"
              >
                Edit product
              </Link>
            )}
          </div>
          {justOpened[group.product.id] && (
            <OpeningChecks code={justOpened[group.product.id]!.code} productName={group.product.name} />
          )}
        </li>
      ))}
    </ul>
  );
}
