import type { MonthlyUse } from '@shared/schemas/restock';
import { monthWords } from '@shared/words';

const WIDTH = 240;
const HEIGHT = 72;
const LABEL = 16;

/** Tablespoons finished each month, as bars; the numbers are in the accessible name too. */
export default function UseChart({ productName, months }: { productName: string; months: MonthlyUse[] }) {
  const most = Math.max(...months.map((m) => m.tbsp), 1);
  const slot = WIDTH / months.length;
  const summary = months.map((m) => `${monthWords(m.month)} ${Math.round(m.tbsp)} tbsp`).join(', ');
  return (
    <svg
      viewBox={`0 0 ${WIDTH} ${HEIGHT + LABEL}`}
      className="h-auto w-full max-w-xs"
      role="img"
      aria-label={`${productName}, used per month: ${summary}`}
    >
      <line x1="0" x2={WIDTH} y1={HEIGHT} y2={HEIGHT} className="stroke-line" strokeWidth="1" />
      {months.map((month, index) => {
        const height = (month.tbsp / most) * (HEIGHT - 8);
        const x = index * slot + slot * 0.2;
        return (
          <g key={month.month}>
            <rect x={x} y={HEIGHT - height} width={slot * 0.6} height={height} rx="3" className="fill-info" />
            <text x={x + slot * 0.3} y={HEIGHT + LABEL - 3} textAnchor="middle" className="fill-ink-muted text-[10px]">
              {monthWords(month.month)}
            </text>
          </g>
        );
      })}
    </svg>
  );
}
