import { Router } from 'express';
import multer from 'multer';
import { ERROR_CODES } from '@/shared/schemas/common';
import { shortIdParam } from '@/shared/schemas/report';
import { depsOf } from '../app';
import { AppError, badRequest } from '../errors';
import { publicRateLimit } from '../middleware/rate-limit';
import { memoryUpload } from '../middleware/upload';
import { openShare, sharedPdf } from '../services/report-shares';
import { verifyPdf, verifyShortId } from '../services/report-verify';
import { sendPdf } from './reports';

export const VERIFY_MAX_BYTES = 25 * 1024 * 1024;

/** One PDF in the `pdf` field, into memory only: it is hashed and dropped. */
const pdfUpload = () =>
  memoryUpload({
    limits: { fileSize: VERIFY_MAX_BYTES, files: 1, fields: 5, fieldSize: 1024, parts: 6 },
    accept: (upload) => upload.single('pdf'),
    notMultipart: 'Send the PDF as multipart/form-data.',
    mapError: (err) => {
      if (!(err instanceof multer.MulterError)) return err;
      if (err.code === 'LIMIT_FILE_SIZE')
        return new AppError(413, ERROR_CODES.tooLarge, 'A report PDF may be at most 25 MB.', {
          pdf: 'At most 25 MB.',
        });
      return badRequest({ pdf: 'Send one PDF file in the "pdf" field.' });
    },
    noFile: () => badRequest({ pdf: 'Choose the PDF file to check.' }),
  });

/** The signed-out side of reports: share links and the verification page. No account, no cookies. */
export function publicRoutes() {
  const router = Router();
  router.use(publicRateLimit());
  // Share links and verification answers are for whoever holds them, not for search engines.
  router.use((_req, res, next) => {
    res.setHeader('X-Robots-Tag', 'noindex, nofollow');
    next();
  });

  router.get('/shares/:token', async (req, res) => {
    res.setHeader('Cache-Control', 'no-store');
    res.json(await openShare(String(req.params.token)));
  });

  router.get('/shares/:token/pdf', async (req, res) => {
    sendPdf(res, await sharedPdf(String(req.params.token), depsOf(req).storage));
  });

  router.get('/verify/:shortId', async (req, res) => {
    const parsed = shortIdParam.safeParse(req.params.shortId);
    if (!parsed.success) throw badRequest({ shortId: parsed.error.issues[0].message });
    res.json(await verifyShortId(parsed.data));
  });

  router.post('/verify', pdfUpload(), async (req, res) => {
    const pdf = req.file!.buffer;
    if (!pdf.subarray(0, 5).equals(Buffer.from('%PDF-')))
      throw new AppError(415, ERROR_CODES.unsupportedMedia, 'That file is not a PDF.', {
        pdf: 'Not a PDF file.',
      });
    res.json(await verifyPdf(pdf));
  });

  return router;
}
