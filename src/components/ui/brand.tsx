export function Brand({ compact = false }: { compact?: boolean }) {
  return (
    <span className="flex items-center gap-2 font-bold text-action">
      <img src="/icon.svg" alt="" width="32" height="32" />
      {!compact && <span className="text-xl tracking-tight">Larderly</span>}
      {compact && <span className="sr-only">Larderly</span>}
    </span>
  );
}
