import { lazy, Suspense, useEffect, useRef, useState } from 'react';
import type { MonthlyUse } from '@shared/schemas/restock';

const UseChart = lazy(() => import('./use-chart'));

/** Loads the chart's code only once its card scrolls near the screen. */
export function LazyUseChart({ productName, months }: { productName: string; months: MonthlyUse[] }) {
  const holder = useRef<HTMLDivElement>(null);
  const [near, setNear] = useState(false);
  useEffect(() => {
    const element = holder.current;
    if (!element || near) return;
    const observer = new IntersectionObserver((entries) => entries.some((e) => e.isIntersecting) && setNear(true), {
      rootMargin: '200px',
    });
    observer.observe(element);
    return () => observer.disconnect();
  }, [near]);
  const empty = months.every((m) => m.tbsp === 0);
  return (
    <div ref={holder} className="min-h-[5.5rem]">
      {empty ? (
        <p className="text-sm text-ink-muted">No jars finished in the last six months.</p>
      ) : (
        <Suspense fallback={<div className="h-[5.5rem] rounded-lg bg-sunken/50" />}>
          {near ? (
            <UseChart productName={productName} months={months} />
          ) : (
            <div className="h-[5.5rem] rounded-lg bg-sunken/50" />
          )}
        </Suspense>
      )}
    </div>
  );
}
