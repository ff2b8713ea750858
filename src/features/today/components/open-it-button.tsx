import { Button } from '@/components/ui/button';
import { useActOnJar } from '@/features/shelf';

/** "Open it" for one new jar on Today, with the shelf's open-jar change and its undo toast; loaded only when a jar is due. */
export default function OpenItButton({
  hid,
  jarId,
  code,
  productName,
}: {
  hid: string;
  jarId: string;
  code: string;
  productName: string;
}) {
  const act = useActOnJar(hid);
  return (
    <span className="flex flex-col items-end gap-1">
      <Button
        variant="secondary"
        disabled={act.isSending}
        aria-label={`Open it: jar ${code} of ${productName}`}
        onClick={() => act.act({ id: jarId, code, productName }, 'open')}
      >
        Open it
      </Button>
      {act.error && (
        <span role="alert" className="font-bold text-past">
          {act.error.message}
        </span>
      )}
    </span>
  );
}
