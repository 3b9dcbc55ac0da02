import { useState } from 'react';
import type { FindingResponse, PhotoResponse } from '@/shared/schemas';
import { cleanError } from '@/src/api/client';
import { useDeleteFinding, useRestoreFinding } from '@/src/api/findings';
import { useDeletePhoto } from '@/src/api/photos';
import { ConfirmDialog, useToast } from '@/src/components/ui';

type Asking = { kind: 'finding' } | { kind: 'photo'; photo: PhotoResponse } | null;

/**
 * Removing the finding (soft, with Undo in the toast) or one of its photos (for good), each
 * after a confirmation. Render `dialog` once in the editor.
 */
export function useFindingRemoval({
  wid,
  finding,
  onPhotoRemoved,
  onFindingRemoved,
}: {
  wid: string;
  finding: FindingResponse | null;
  onPhotoRemoved(photoId: string): void;
  onFindingRemoved?: (finding: FindingResponse) => void;
}) {
  const toast = useToast();
  const [asking, setAsking] = useState<Asking>(null);
  const remove = useDeleteFinding(wid);
  const restore = useRestoreFinding(wid);
  const removePhoto = useDeletePhoto(wid);

  async function confirmed() {
    const what = asking;
    if (!what || !finding) return;
    try {
      if (what.kind === 'photo') {
        await removePhoto.mutateAsync(what.photo.id);
        onPhotoRemoved(what.photo.id);
        toast.show('Photo removed', { kind: 'info' });
      } else {
        await remove.mutateAsync(finding.id);
        const id = finding.id;
        toast.show('Finding removed', {
          kind: 'info',
          action: {
            label: 'Undo',
            onPress: () =>
              restore.mutateAsync(id).then(
                () => toast.show('Finding restored', { kind: 'success' }),
                (e) => toast.show(cleanError(e), { kind: 'error' }),
              ),
          },
        });
        onFindingRemoved?.(finding);
      }
    } catch (e) {
      toast.show(cleanError(e), { kind: 'error' });
    }
    setAsking(null);
  }

  const dialog = (
    <ConfirmDialog
      visible={!!asking}
      title={asking?.kind === 'photo' ? 'Remove this photo?' : 'Remove this finding?'}
      message={
        asking?.kind === 'photo'
          ? 'The photo is deleted from the finding. This cannot be undone.'
          : 'It disappears from the diagram and the counts. You can restore it from the zone history.'
      }
      confirmLabel="Remove"
      busy={remove.isPending || removePhoto.isPending}
      onConfirm={confirmed}
      onCancel={() => setAsking(null)}
    />
  );

  return {
    askFinding: () => setAsking({ kind: 'finding' }),
    askPhoto: (photo: PhotoResponse) => setAsking({ kind: 'photo', photo }),
    dialog,
  };
}
