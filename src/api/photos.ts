import { useMutation, useQueryClient } from '@tanstack/react-query';
import { Platform } from 'react-native';
import { z } from 'zod';
import { photoResponse } from '@/shared/schemas';
import { ApiRequestError, cleanError, request } from './client';
import { findingKeys } from './findings';

/** The server's limits (multer and the content check); checked here too to save a wasted upload. */
export const MAX_PHOTO_BYTES = 15 * 1024 * 1024;
export const PHOTO_TYPES = ['image/jpeg', 'image/png', 'image/webp'] as const;
export const PHOTOS_PER_UPLOAD = 6;

/** A photo picked on the device, not yet uploaded. */
export type PickedPhoto = {
  /** Local key for lists and retries. */
  key: string;
  uri: string;
  name: string;
  mimeType?: string;
  fileSize?: number;
  /** The browser's File, when the picker ran on web. */
  file?: File;
};

const photoList = z.object({ items: z.array(photoResponse) });

const TOO_LARGE = 'That file is larger than 15 MB. Choose a smaller photo.';
const WRONG_TYPE = 'Only JPEG, PNG or WebP photos can be attached.';

/** Why a picked photo cannot be sent, before trying (null when it looks acceptable). */
export function photoProblem(p: PickedPhoto): string | null {
  const size = p.file?.size ?? p.fileSize;
  if (size !== undefined && size > MAX_PHOTO_BYTES) return TOO_LARGE;
  const type = p.file?.type || p.mimeType;
  if (type && !(PHOTO_TYPES as readonly string[]).includes(type)) return WRONG_TYPE;
  return null;
}

/** Plain words for a failed upload; 413 and 415 name the rule that was broken. */
export function photoUploadError(error: unknown): string {
  if (error instanceof ApiRequestError) {
    if (error.status === 413) return TOO_LARGE;
    if (error.status === 415) return WRONG_TYPE;
  }
  return cleanError(error);
}

async function appendPhoto(form: FormData, p: PickedPhoto) {
  if (p.file) form.append('photos', p.file, p.name);
  else if (Platform.OS === 'web') form.append('photos', await (await fetch(p.uri)).blob(), p.name);
  // React Native's FormData takes a file descriptor object in place of a Blob.
  else
    form.append('photos', {
      uri: p.uri,
      name: p.name,
      type: p.mimeType ?? 'image/jpeg',
    } as unknown as Blob);
}

export async function uploadPhotos(wid: string, fid: string, photos: PickedPhoto[], caption = '') {
  const form = new FormData();
  for (const p of photos) await appendPhoto(form, p);
  form.append('caption', caption);
  return (
    await request('POST', `/api/workshops/${wid}/findings/${fid}/photos`, {
      form,
      schema: photoList,
    })
  ).items;
}

/**
 * `mutateAsync({ photos, findingId? })`. `findingId` overrides the hook's when the finding was
 * created moments ago in the same form (before a re-render could pass it in).
 */
export function useUploadPhotos(wid: string, fid?: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({
      photos,
      caption,
      findingId,
    }: {
      photos: PickedPhoto[];
      caption?: string;
      findingId?: string;
    }) => {
      const id = findingId ?? fid;
      if (!id) throw new Error('Save the finding before adding photos.');
      return uploadPhotos(wid, id, photos, caption);
    },
    onSuccess: () => queryClient.invalidateQueries({ queryKey: findingKeys.workshop(wid) }),
  });
}

/** `mutate(photoId)`. */
export function useDeletePhoto(wid: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (pid: string) => request<void>('DELETE', `/api/workshops/${wid}/photos/${pid}`),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: findingKeys.workshop(wid) }),
  });
}
