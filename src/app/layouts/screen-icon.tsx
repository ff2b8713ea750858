import type { ScreenIcon as IconName } from '@/app/screens';

const paths: Record<IconName, string> = {
  sun: 'M12 7a5 5 0 1 0 0 10a5 5 0 1 0 0-10zM12 1v3M12 20v3M1 12h3M20 12h3M4.2 4.2l2.1 2.1M17.7 17.7l2.1 2.1M4.2 19.8l2.1-2.1M17.7 6.3l2.1-2.1',
  grid: 'M3 4h18v17H3zM3 9h18M9 4v17M15 4v17',
  shelf: 'M3 20h18M3 11h18M6 11V6h4v5M13 11V7h4v4M6 20v-6h4v6M14 20v-5h4v5',
  fridge: 'M6 2h12v20H6zM6 10h12M9 5v2M9 13v3',
  pot: 'M4 9h16v8a4 4 0 0 1-4 4H8a4 4 0 0 1-4-4zM2 9h20M9 5c0-1 1-2 3-2s3 1 3 2',
  card: 'M4 4h16v16H4zM8 9h8M8 13h8M8 17h5',
  // A jar with a plus: a new batch to make, not a clock or a history.
  'jar-plus':
    'M8 3h8M9 3v3M15 3v3M6 8a2 2 0 0 1 2-2h8a2 2 0 0 1 2 2v11a2 2 0 0 1-2 2H8a2 2 0 0 1-2-2zM12 10.5v6M9 13.5h6',
  check: 'M4 6h2M4 12h2M4 18h2M9 6h11M9 12h11M9 18h11',
  home: 'M3 11l9-7 9 7M5 10v10h14V10M10 20v-6h4v6',
  more: 'M5 12h.01M12 12h.01M19 12h.01',
};

export function ScreenIcon({ name, className = '' }: { name: IconName; className?: string }) {
  return (
    <svg
      viewBox="0 0 24 24"
      className={`h-6 w-6 ${className}`}
      fill="none"
      stroke="currentColor"
      strokeWidth={name === 'more' ? 3.5 : 1.8}
      strokeLinecap="round"
      strokeLinejoin="round"
      aria-hidden="true"
    >
      <path d={paths[name]} />
    </svg>
  );
}
