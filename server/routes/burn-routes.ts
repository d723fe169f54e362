import { Router, type ErrorRequestHandler, type RequestHandler } from 'express';
import multer from 'multer';
import { MAX_PHOTO_BYTES, createBurnInputSchema, updateBurnInputSchema } from '../../shared/burns/burn-schema.ts';
import { AppError } from '../http/app-error.ts';
import { currentUser, requireUser } from '../http/session.ts';
import { parseInput } from '../http/validate.ts';
import type { BurnLog } from '../burns/burn-log.ts';

const PHOTO_FIELD = 'photo';
const megabytes = MAX_PHOTO_BYTES / 1024 / 1024;

/** One picture per request, held in memory only while it is checked and re-encoded (multer). */
const receivePhoto = multer({ storage: multer.memoryStorage(), limits: { fileSize: MAX_PHOTO_BYTES, files: 1, fields: 4, parts: 5 } }).single(PHOTO_FIELD);

/** multer's refusals, in the maker's words. */
const uploadRefusal: ErrorRequestHandler = (error, _req, _res, next) => {
  if (!(error instanceof multer.MulterError)) return next(error);
  if (error.code === 'LIMIT_FILE_SIZE') return next(new AppError(413, 'PHOTO_TOO_LARGE', `This file is larger than ${megabytes} MB. Save a smaller copy of the picture and send that.`));
  if (error.code === 'LIMIT_UNEXPECTED_FILE' || error.code === 'LIMIT_FILE_COUNT') return next(new AppError(400, 'INVALID_UPLOAD', `Send one picture, in the form field named "${PHOTO_FIELD}".`));
  next(new AppError(400, 'INVALID_UPLOAD', 'The upload could not be read. Choose the picture again and send it.'));
};

/**
 * The burn log: /api/designs/:id/burns, /api/burns/:burnId (and its photos), /api/photos/:photoId.
 * Everything is the signed-in maker's own; another maker's ids answer 404, as missing ones do.
 */
export function burnRoutes(log: BurnLog): Router {
  const router = Router();
  const owner = (res: Parameters<RequestHandler>[1]) => currentUser(res).id;

  router.get('/designs/:id/burns', requireUser, async (req, res) => {
    res.json(await log.listBurns(owner(res), req.params.id as string));
  });
  router.post('/designs/:id/burns', requireUser, async (req, res) => {
    res.status(201).json(await log.logBurn(owner(res), req.params.id as string, parseInput(createBurnInputSchema, req.body)));
  });
  router.get('/burns/:burnId', requireUser, async (req, res) => {
    res.json(await log.getBurn(owner(res), req.params.burnId as string));
  });
  router.patch('/burns/:burnId', requireUser, async (req, res) => {
    res.json(await log.updateBurn(owner(res), req.params.burnId as string, parseInput(updateBurnInputSchema, req.body)));
  });
  router.delete('/burns/:burnId', requireUser, async (req, res) => {
    await log.deleteBurn(owner(res), req.params.burnId as string);
    res.status(204).end();
  });

  // The entry is checked before a byte of the upload is read.
  const entryExists: RequestHandler = async (req, res, next) => {
    await log.getBurn(owner(res), req.params.burnId as string);
    next();
  };
  const storePhoto: RequestHandler = async (req, res) => {
    if (!req.file) throw new AppError(400, 'INVALID_UPLOAD', `Send the picture as a file in the form field named "${PHOTO_FIELD}".`);
    res.status(201).json(await log.addPhoto(owner(res), req.params.burnId as string, req.file.buffer));
  };
  router.post('/burns/:burnId/photos', requireUser, entryExists, receivePhoto, uploadRefusal, storePhoto);

  const servePhoto = (size: 'image' | 'thumbnail'): RequestHandler => async (req, res) => {
    const { bytes, contentType } = await log.readPhoto(owner(res), req.params.photoId as string, size);
    res.set({
      'Content-Type': contentType,
      'X-Content-Type-Options': 'nosniff',
      // A photo never changes under its id; only its owner may see it, so no shared cache keeps it.
      'Cache-Control': 'private, max-age=31536000, immutable',
      'Content-Disposition': 'inline',
    });
    res.end(Buffer.from(bytes));
  };
  router.get('/photos/:photoId', requireUser, servePhoto('image'));
  router.get('/photos/:photoId/thumbnail', requireUser, servePhoto('thumbnail'));
  router.delete('/photos/:photoId', requireUser, async (req, res) => {
    await log.deletePhoto(owner(res), req.params.photoId as string);
    res.status(204).end();
  });
  return router;
}
