import QRCode from 'qrcode';
import { useEffect, useState } from 'react';
import type { BatchDetail, JarView } from '@shared/schemas/batches';
import { DATE_NAMES, labelDateWords } from '@shared/words';
import { usePublicConfig } from '@/lib/public-config';

export type Paper = 'a4' | 'letter';

// Common sheet layouts: A4 with 21 labels (63.5 x 38.1 mm), US Letter with 30 labels (2 5/8 x 1 in).
const PAPER_CSS: Record<Paper, string> = {
  a4: '@page { size: A4; margin: 15.1mm 7.2mm; } .label-sheet { --label-w: 63.5mm; --label-h: 38.1mm; --gap: 2.5mm; }',
  letter:
    '@page { size: letter; margin: 0.5in 0.19in; } .label-sheet { --label-w: 2.625in; --label-h: 1in; --gap: 0.125in; }',
};

/** The address a label's QR code opens: the configured public origin's /j/<code>, else this browser's. */
export function jarUrl(code: string, publicOrigin: string | null) {
  return `${publicOrigin ?? window.location.origin}/j/${code}`;
}

function JarLabel({ jar, origin }: { jar: JarView; origin: string | null }) {
  const [qr, setQr] = useState<string | null>(null);
  useEffect(() => {
    let live = true;
    void QRCode.toString(jarUrl(jar.code, origin), { type: 'svg', margin: 1, errorCorrectionLevel: 'M' }).then(
      (svg) => {
        if (live) setQr(`data:image/svg+xml;charset=utf-8,${encodeURIComponent(svg)}`);
      },
    );
    return () => {
      live = false;
    };
  }, [jar.code, origin]);
  return (
    <li
      className="jar-label flex items-center gap-2 overflow-hidden rounded-md border border-line bg-surface px-2 print:rounded-none print:bg-white print:border-dashed"
      data-code={jar.code}
    >
      {qr ? (
        <img
          src={qr}
          alt={`QR code for jar ${jar.code}`}
          className="aspect-square h-[calc(var(--label-h)*0.8)] shrink-0"
        />
      ) : (
        <span className="aspect-square h-[calc(var(--label-h)*0.8)]" />
      )}
      <span className="flex min-w-0 flex-col gap-0.5 leading-tight">
        <span className="line-clamp-2 font-bold">{jar.productName}</span>
        {/* A date's name may wrap above it on a narrow label; the date itself stays on one line. */}
        <span className="tabular">
          {DATE_NAMES.canned} <span className="whitespace-nowrap">{labelDateWords(jar.cannedOn)}</span>
        </span>
        <span className="tabular">
          {DATE_NAMES.bestQuality} <span className="whitespace-nowrap">{labelDateWords(jar.bestBy)}</span>
        </span>
        <span className="font-mono font-bold tracking-wider">{jar.code}</span>
      </span>
    </li>
  );
}

export function LabelSheet({ batch, paper }: { batch: BatchDetail; paper: Paper }) {
  const config = usePublicConfig();
  // Labels for the jars still to eat; finished and discarded jars need none.
  const jars = batch.jars.filter((jar) => jar.state === 'sealed' || jar.state === 'opened');
  // The codes wait for the configured origin, so a sheet printed at once never points at this browser's address.
  if (config.isPending) return <p className="text-ink-muted">Preparing the labels…</p>;
  return (
    <>
      <style>{`${PAPER_CSS[paper]}
        .label-sheet ul { display: grid; grid-template-columns: repeat(3, var(--label-w)); grid-auto-rows: var(--label-h); column-gap: var(--gap); row-gap: 0; }
        @media print { html, body { background: white; } .label-sheet li { break-inside: avoid; } }
        .label-sheet li { font-size: ${paper === 'letter' ? '9pt' : '10pt'}; }`}</style>
      <div className="label-sheet">
        <ul aria-label={`Labels for ${jars.length} jars`}>
          {jars.map((jar) => (
            <JarLabel key={jar.id} jar={jar} origin={config.data?.publicOrigin ?? null} />
          ))}
        </ul>
      </div>
    </>
  );
}
