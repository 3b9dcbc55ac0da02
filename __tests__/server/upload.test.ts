import express, { type ErrorRequestHandler } from 'express';
import request from 'supertest';
import { AppError } from '@/server/errors';
import { photoUpload, UPLOAD_LIMITS } from '@/server/middleware/upload';

function makeApp() {
  const app = express();
  app.post('/upload', photoUpload(), (req, res) => {
    const files = req.files as Express.Multer.File[];
    res.json({
      caption: req.body.caption ?? null,
      files: files.map((f) => ({
        name: f.originalname,
        size: f.size,
        first: f.buffer[0],
        last: f.buffer[f.size - 1],
      })),
    });
  });
  const onError: ErrorRequestHandler = (err, _req, res, _next) => {
    if (err instanceof AppError) {
      res
        .status(err.status)
        .json({ error: { code: err.code, message: err.message, fields: err.fields } });
    } else {
      res.status(500).json({ error: { code: 'internal_error', message: String(err) } });
    }
  };
  app.use(onError);
  return app;
}

const bytes = (size: number, fill: number) => {
  const b = Buffer.alloc(size, fill);
  b[0] = 0xff;
  b[size - 1] = 0xd9;
  return b;
};

describe('photoUpload', () => {
  const app = makeApp();

  it('puts every photo in memory and the caption in the body', async () => {
    const res = await request(app)
      .post('/upload')
      .field('caption', 'Nearside sill, rear third')
      .attach('photos', bytes(1000, 1), 'a.jpg')
      .attach('photos', bytes(2500, 2), 'b.jpg');
    expect(res.status).toBe(200);
    expect(res.body).toEqual({
      caption: 'Nearside sill, rear third',
      files: [
        { name: 'a.jpg', size: 1000, first: 0xff, last: 0xd9 },
        { name: 'b.jpg', size: 2500, first: 0xff, last: 0xd9 },
      ],
    });
  });

  it('accepts a photo of exactly the size limit', async () => {
    const res = await request(app)
      .post('/upload')
      .attach('photos', bytes(UPLOAD_LIMITS.fileSize, 3), 'max.jpg');
    expect(res.status).toBe(200);
    expect(res.body.files[0].size).toBe(UPLOAD_LIMITS.fileSize);
  });

  it('answers 413 too_large, naming the limit, for a photo one byte over it', async () => {
    const res = await request(app)
      .post('/upload')
      .attach('photos', bytes(UPLOAD_LIMITS.fileSize + 1, 4), 'big.jpg');
    expect(res.status).toBe(413);
    expect(res.body.error.code).toBe('too_large');
    expect(res.body.error.message).toMatch(/15 MB/);
  });

  it('answers 400 naming the photos field for more than six photos', async () => {
    let req = request(app).post('/upload');
    for (let i = 0; i < UPLOAD_LIMITS.files + 1; i++)
      req = req.attach('photos', bytes(100, i), `${i}.jpg`);
    const res = await req;
    expect(res.status).toBe(400);
    expect(res.body.error.code).toBe('validation_failed');
    expect(res.body.error.fields.photos).toMatch(/at most 6/);
  });

  it('answers 400 naming the photos field for a file in another field', async () => {
    const res = await request(app).post('/upload').attach('document', bytes(100, 1), 'x.jpg');
    expect(res.status).toBe(400);
    expect(res.body.error.code).toBe('validation_failed');
    expect(res.body.error.fields).toHaveProperty('photos');
  });

  it('answers 400 when no photo was sent', async () => {
    const res = await request(app).post('/upload').field('caption', 'only words');
    expect(res.status).toBe(400);
    expect(res.body.error.fields.photos).toMatch(/at least one/);
  });

  it('answers 400 naming the field for a text field over 10 kB', async () => {
    const res = await request(app)
      .post('/upload')
      .field('caption', 'x'.repeat(UPLOAD_LIMITS.fieldSize + 1))
      .attach('photos', bytes(100, 1), 'a.jpg');
    expect(res.status).toBe(400);
    expect(res.body.error.fields).toHaveProperty('caption');
  });

  it('answers 400 for too many text fields', async () => {
    let req = request(app).post('/upload');
    for (let i = 0; i < UPLOAD_LIMITS.fields + 1; i++) req = req.field(`f${i}`, 'v');
    const res = await req.attach('photos', bytes(100, 1), 'a.jpg');
    expect(res.status).toBe(400);
    expect(res.body.error.code).toBe('validation_failed');
  });

  it('answers 400 for a multipart body that is cut off', async () => {
    const boundary = 'sfboundary';
    const body = `--${boundary}\r\nContent-Disposition: form-data; name="photos"; filename="a.jpg"\r\nContent-Type: image/jpeg\r\n\r\n\xff\xd8\xff partial`;
    const res = await request(app)
      .post('/upload')
      .set('Content-Type', `multipart/form-data; boundary=${boundary}`)
      .send(body);
    expect(res.status).toBe(400);
    expect(res.body.error.code).toBe('validation_failed');
  });

  it('answers 415 for a request that is not multipart', async () => {
    const json = await request(app)
      .post('/upload')
      .send({ photos: ['not a file'] });
    expect(json.status).toBe(415);
    expect(json.body.error.code).toBe('unsupported_media_type');
    const raw = await request(app)
      .post('/upload')
      .set('Content-Type', 'image/jpeg')
      .send(bytes(100, 1));
    expect(raw.status).toBe(415);
    const empty = await request(app).post('/upload');
    expect(empty.status).toBe(415);
  });
});
