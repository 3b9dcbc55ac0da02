import { Router, type RequestHandler } from 'express';
import { ipKeyGenerator, rateLimit } from 'express-rate-limit';
import multer from 'multer';
import { ERROR_CODES } from '@/shared/schemas/common';
import { shortIdParam } from '@/shared/schemas/report';
import { depsOf } from '../app';
import { AppError, badRequest } from '../errors';
import { openShare, sharedPdf } from '../services/report-shares';
import { verifyPdf, verifyShortId } from '../services/report-verify';
import { sendPdf } from './reports';

export const VERIFY_MAX_BYTES = 25 * 1024 * 1024;

/** Per IP, `PUBLIC_RATE_LIMIT` requests in 15 minutes: links and identifiers cannot be guessed at speed. */
function publicRateLimit(): RequestHandler {
  return rateLimit({
    windowMs: 15 * 60_000,
    limit: (req) => depsOf(req).config.publicRateLimit,
    standardHeaders: 'draft-8',
    legacyHeaders: false,
    keyGenerator: (req) => ipKeyGenerator(req.ip ?? ''),
    handler: (_req, _res, next) =>
      next(
        new AppError(
          429,
          ERROR_CODES.rateLimited,
          'Too many requests from this address. Wait 15 minutes and try again.',
        ),
      ),
  });
}

const chooseFile = () => badRequest({ pdf: 'Choose the PDF file to check.' });

/** One PDF in the `pdf` field, into memory only: it is hashed and dropped. */
function pdfUpload(): RequestHandler {
  const parse = multer({
    storage: multer.memoryStorage(),
    limits: { fileSize: VERIFY_MAX_BYTES, files: 1, fields: 5, fieldSize: 1024, parts: 6 },
  }).single('pdf');
  return (req, res, next) => {
    if (!req.is('multipart/form-data'))
      return next(
        new AppError(415, ERROR_CODES.unsupportedMedia, 'Send the PDF as multipart/form-data.'),
      );
    parse(req, res, (err?: unknown) => {
      if (err instanceof multer.MulterError && err.code === 'LIMIT_FILE_SIZE')
        return next(
          new AppError(413, ERROR_CODES.tooLarge, 'A report PDF may be at most 25 MB.', {
            pdf: 'At most 25 MB.',
          }),
        );
      if (err instanceof multer.MulterError)
        return next(badRequest({ pdf: 'Send one PDF file in the "pdf" field.' }));
      if (err) return next(err);
      if (!req.file) return next(chooseFile());
      next();
    });
  };
}

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
