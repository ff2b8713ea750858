import type { ReactNode } from 'react';
import { Brand } from '@/components/ui/brand';

export function AuthLayout({ title, lead, children }: { title: string; lead: string; children: ReactNode }) {
  return (
    <main className="mx-auto flex min-h-dvh w-full max-w-md flex-col justify-center gap-6 px-5 py-10">
      <Brand />
      <div>
        <h1 className="text-3xl">{title}</h1>
        <p className="mt-2 text-ink-muted">{lead}</p>
      </div>
      <div className="rounded-card border border-line bg-surface p-5">{children}</div>
    </main>
  );
}
