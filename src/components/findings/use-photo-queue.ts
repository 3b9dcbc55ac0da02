import * as ImagePicker from 'expo-image-picker';
import { useCallback, useEffect, useRef, useState } from 'react';
import { ApiRequestError } from '@/src/api/client';
import { newId } from '@/src/api/ids';
import {
  photoProblem,
  photoUploadError,
  PHOTOS_PER_UPLOAD,
  useUploadPhotos,
  type PickedPhoto,
} from '@/src/api/photos';

export type QueuedPhoto = PickedPhoto & {
  status: 'waiting' | 'uploading' | 'done' | 'failed' | 'rejected';
  error?: string;
  width?: number;
  height?: number;
};

export type PhotoSource = 'library' | 'camera';

function toPicked(asset: ImagePicker.ImagePickerAsset, i: number): QueuedPhoto {
  const p: PickedPhoto = {
    key: newId(),
    uri: asset.uri,
    name: asset.fileName ?? asset.file?.name ?? `photo-${i + 1}.jpg`,
    mimeType: asset.mimeType,
    fileSize: asset.fileSize,
    file: asset.file,
  };
  const problem = photoProblem(p);
  return {
    ...p,
    width: asset.width,
    height: asset.height,
    status: problem ? 'rejected' : 'waiting',
    error: problem ?? undefined,
  };
}

/**
 * Photos picked for one finding and their upload state. Each photo goes up on its own request,
 * so one failure shows against that photo (with a retry) and never costs the others or the finding.
 */
export function usePhotoQueue(wid: string) {
  const [items, setItems] = useState<QueuedPhoto[]>([]);
  // Uploads run in event handlers after a render, so the ref always holds the list on screen.
  const itemsRef = useRef(items);
  useEffect(() => {
    itemsRef.current = items;
  }, [items]);
  const upload = useUploadPhotos(wid);

  const patch = useCallback((key: string, change: Partial<QueuedPhoto>) => {
    setItems((list) => list.map((p) => (p.key === key ? { ...p, ...change } : p)));
  }, []);

  /** Opens the camera or the library (the file chooser on web); resolves with a problem message or null. */
  const pick = useCallback(async (source: PhotoSource): Promise<string | null> => {
    try {
      if (source === 'camera') {
        const perm = await ImagePicker.requestCameraPermissionsAsync();
        if (!perm.granted)
          return 'Soundframe may not use the camera. Allow it in the device settings, or choose photos instead.';
      }
      const options: ImagePicker.ImagePickerOptions = {
        mediaTypes: ['images'],
        quality: 0.85,
        allowsMultipleSelection: source === 'library',
        selectionLimit: PHOTOS_PER_UPLOAD,
      };
      const result =
        source === 'camera'
          ? await ImagePicker.launchCameraAsync(options)
          : await ImagePicker.launchImageLibraryAsync(options);
      if (result.canceled || !result.assets?.length) return null;
      const picked = result.assets.map(toPicked);
      setItems((list) => [...list, ...picked]);
      return null;
    } catch {
      // The web picker refuses files that are not images before we see them.
      return 'Only JPEG, PNG or WebP photos can be attached.';
    }
  }, []);

  const remove = useCallback(
    (key: string) => setItems((list) => list.filter((p) => p.key !== key)),
    [],
  );

  const sendOne = useCallback(
    async (item: QueuedPhoto, findingId: string): Promise<boolean> => {
      patch(item.key, { status: 'uploading', error: undefined });
      try {
        await upload.mutateAsync({ findingId, photos: [item] });
        patch(item.key, { status: 'done' });
        return true;
      } catch (e) {
        // A refused file (too large, not an image) fails the same way again: no retry offered.
        const refused = e instanceof ApiRequestError && (e.status === 413 || e.status === 415);
        patch(item.key, { status: refused ? 'rejected' : 'failed', error: photoUploadError(e) });
        return false;
      }
    },
    [patch, upload],
  );

  /** Uploads every waiting or failed photo, one after another; true when none is left failing. */
  const uploadAll = useCallback(
    async (findingId: string): Promise<boolean> => {
      let ok = true;
      for (const item of itemsRef.current.filter(
        (p) => p.status === 'waiting' || p.status === 'failed',
      ))
        ok = (await sendOne(item, findingId)) && ok;
      return ok;
    },
    [sendOne],
  );

  const retry = useCallback(
    (key: string, findingId: string) => {
      const item = itemsRef.current.find((p) => p.key === key);
      return item ? sendOne(item, findingId) : Promise.resolve(false);
    },
    [sendOne],
  );

  const pending = items.filter((p) => p.status === 'waiting' || p.status === 'failed').length;
  const uploading = items.some((p) => p.status === 'uploading');
  return { items, pick, remove, uploadAll, retry, pending, uploading };
}

export type PhotoQueue = ReturnType<typeof usePhotoQueue>;
