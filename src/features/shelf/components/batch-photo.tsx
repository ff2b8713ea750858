import { useId } from 'react';
import type { BatchDetail } from '@shared/schemas/batches';
import { Notice } from '@/components/ui/notice';
import { batchPhotoUrl, useUploadBatchPhoto } from '../api/upload-photo';

export function BatchPhoto({ hid, batch, canUpload }: { hid: string; batch: BatchDetail; canUpload: boolean }) {
  const upload = useUploadBatchPhoto(hid, batch.id);
  const id = useId();
  return (
    <div className="flex flex-col gap-2">
      {batch.hasPhoto ? (
        <img
          src={batchPhotoUrl(hid, batch.id, String(upload.submittedAt || 0))}
          alt={`The ${batch.productName} batch`}
          className="max-h-72 w-full rounded-card border border-line object-cover"
        />
      ) : (
        <p className="text-ink-muted">No photo of this batch yet.</p>
      )}
      {canUpload && (
        <div>
          <label
            htmlFor={id}
            className="inline-flex min-h-11 cursor-pointer items-center rounded-lg border border-line bg-surface px-4 font-bold hover:bg-sunken focus-within:outline-3"
          >
            {upload.isPending ? 'Uploading…' : batch.hasPhoto ? 'Replace the photo' : 'Add a photo'}
          </label>
          <input
            id={id}
            type="file"
            accept="image/jpeg,image/png,image/webp"
            className="sr-only"
            onChange={(e) => {
              const file = e.target.files?.[0];
              if (file) upload.mutate(file);
              e.target.value = '';
            }}
          />
          <p className="text-sm text-ink-muted">A JPEG, PNG or WebP photo of 5 MB at most.</p>
        </div>
      )}
      {upload.error && (
        <Notice tone="past" role="alert">
          {upload.error.message}
        </Notice>
      )}
    </div>
  );
}
