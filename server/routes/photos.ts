import { Router } from 'express';
import { uploadPhotosFields } from '@/shared/schemas/finding';
import { depsOf } from '../app';
import { photoUpload } from '../middleware/upload';
import { validate } from '../middleware/validate';
import { memberOf, requireAction } from '../middleware/workshop';
import * as photos from '../services/photos';

export function photoRoutes() {
  const router = Router();

  router.post(
    '/findings/:findingId/photos',
    requireAction('photos.write'),
    // Refuse before reading up to 90 MB of upload for a finding the caller cannot reach.
    async (req, res, next) => {
      await photos.assertCanAttach(memberOf(res), String(req.params.findingId));
      next();
    },
    photoUpload('photos'),
    validate({ body: uploadPhotosFields }),
    async (req, res) => {
      const files = (req.files ?? []) as Express.Multer.File[];
      const items = await photos.addPhotos(
        memberOf(res),
        depsOf(req).storage,
        String(req.params.findingId),
        files,
        req.body.caption,
      );
      res.status(201).json({ items });
    },
  );

  for (const rendition of photos.RENDITIONS) {
    router.get(
      `/photos/:photoId/${rendition}`,
      requireAction('vehicles.read'),
      async (req, res) => {
        const bytes = await photos.readRendition(
          memberOf(res),
          depsOf(req).storage,
          String(req.params.photoId),
          rendition,
        );
        res.set({
          'Content-Type': 'image/jpeg',
          'Cache-Control': 'private, max-age=300',
          'X-Content-Type-Options': 'nosniff',
          'Content-Length': String(bytes.length),
        });
        res.end(bytes);
      },
    );
  }

  router.delete('/photos/:photoId', requireAction('photos.write'), async (req, res) => {
    await photos.deletePhoto(memberOf(res), depsOf(req).storage, String(req.params.photoId));
    res.status(204).end();
  });

  return router;
}
