import type { ReactNode } from 'react';

type Tone = 'info' | 'soon' | 'past' | 'action';

const tones: Record<Tone, string> = {
  info: 'border-info/40 bg-info-soft text-ink',
  soon: 'border-soon-fill bg-soon-soft text-ink',
  past: 'border-past/50 bg-past-soft text-ink',
  action: 'border-action/40 bg-action-soft text-ink',
};

export function Notice({
  tone = 'info',
  title,
  children,
  role,
}: {
  tone?: Tone;
  title?: string;
  children?: ReactNode;
  role?: 'alert' | 'status';
}) {
  return (
    <div className={`rounded-card border px-4 py-3 ${tones[tone]}`} role={role}>
      {title && <p className="font-bold">{title}</p>}
      {children && <div className="text-[0.95rem]">{children}</div>}
    </div>
  );
}
