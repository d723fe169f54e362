import { rm } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import { pipeline } from 'node:stream/promises';
import { Router, type ErrorRequestHandler, type RequestHandler } from 'express';
import multer from 'multer';
import { ARCHIVE_FIELD, archiveLimits, importOptionsSchema } from '../../shared/archive/archive-format.ts';
import type { LibraryExporter } from '../archive/export-library.ts';
import type { LibraryImporter } from '../archive/import-library.ts';
import { AppError } from '../http/app-error.ts';
import { currentUser, requireUser } from '../http/session.ts';
import { parseInput } from '../http/validate.ts';

const megabytes = archiveLimits.maxArchiveBytes / 1024 / 1024;

/** The archive goes to a temporary file (never all in memory), read there with random access, and removed after. */
const receiveArchive = multer({ dest: tmpdir(), limits: { fileSize: archiveLimits.maxArchiveBytes, files: 1, fields: 2, parts: 3 } }).single(ARCHIVE_FIELD);

const uploadRefusal: ErrorRequestHandler = (error, _req, _res, next) => {
  if (!(error instanceof multer.MulterError)) return next(error);
  if (error.code === 'LIMIT_FILE_SIZE') return next(new AppError(413, 'ARCHIVE_TOO_LARGE', `This file is larger than ${megabytes} MB, more than a Canwright library can be. Nothing was imported.`));
  if (error.code === 'LIMIT_UNEXPECTED_FILE' || error.code === 'LIMIT_FILE_COUNT') return next(new AppError(400, 'INVALID_UPLOAD', `Send one .zip file, in the form field named "${ARCHIVE_FIELD}".`));
  next(new AppError(400, 'INVALID_UPLOAD', 'The upload could not be read. Choose the .zip file again and send it.'));
};

/** /api/library: the signed-in maker's whole library as one ZIP, out and in. Always the caller's own. */
export function libraryRoutes(exporter: LibraryExporter, importer: LibraryImporter): Router {
  const router = Router();

  router.get('/export', requireUser, async (_req, res) => {
    const archive = await exporter.exportLibrary(currentUser(res).id);
    res.set({
      'Content-Type': 'application/zip',
      'Content-Disposition': `attachment; filename="${archive.fileName}"`,
      'Cache-Control': 'private, no-store',
      'X-Content-Type-Options': 'nosniff',
    });
    try {
      await pipeline(archive.stream, res);
    } catch (error) {
      // The answer has begun: the connection is cut, so the download is seen to fail rather than end short.
      console.error(`Library export of ${currentUser(res).id} stopped: ${(error as Error).message}`);
      res.destroy();
    }
  });

  const importArchive: RequestHandler = async (req, res) => {
    const file = req.file;
    try {
      const options = parseInput(importOptionsSchema, { ...req.body });
      if (!file) throw new AppError(400, 'INVALID_UPLOAD', `Send the library as a .zip file in the form field named "${ARCHIVE_FIELD}".`);
      res.status(201).json(await importer.importLibrary(currentUser(res).id, file.path, options));
    } finally {
      if (file) await rm(file.path, { force: true });
    }
  };
  router.post('/import', requireUser, receiveArchive, uploadRefusal, importArchive);
  return router;
}
