import type { RequestHandler } from "express";
import multer from "multer";
import { probeLimits } from "../../../shared/schemas/probes";
import { AppError, InvalidError } from "../../lib/errors";
import type { UploadedFile } from "./parse/read-upload";

/** An upload over the size limit (413). */
export class PayloadTooLargeError extends AppError {
  constructor(message: string) {
    super("PAYLOAD_TOO_LARGE", message);
  }
}

const MB = probeLimits.maxFileBytes / (1024 * 1024);

const receive = multer({
  storage: multer.memoryStorage(),
  limits: { fileSize: probeLimits.maxFileBytes, files: 2, fields: 8, fieldSize: 4096, parts: 10 },
}).fields([
  { name: "matrix", maxCount: 1 },
  { name: "input", maxCount: 1 },
]);

function translate(err: unknown): unknown {
  if (!(err instanceof multer.MulterError)) return err;
  const field = err.field ?? "file";
  switch (err.code) {
    case "LIMIT_FILE_SIZE":
      return new PayloadTooLargeError(`The ${field} file is larger than the upload limit of ${MB} MB`);
    case "LIMIT_UNEXPECTED_FILE":
      return new InvalidError(`Unexpected file field "${field}": send the coupling matrix as "matrix" and the optional input vector as "input"`, [{ path: field, message: "Unexpected file field" }]);
    default:
      return new InvalidError(`The upload could not be read: ${err.message}`, [{ path: field, message: err.message }]);
  }
}

/**
 * multer 2 with memory storage (nothing touches the disk, so nothing stays behind for a
 * rejected file): at most two files — `matrix` and `input` — of 40 MB each; multer's failures
 * become the shared error body (413 over the size limit, 422 otherwise).
 */
export const receiveProbeFiles: RequestHandler = (req, res, next) => {
  receive(req, res, (err?: unknown) => next(err === undefined ? undefined : translate(err)));
};

/** The files multer put on the request: the matrix (required) and the input vector. */
export function uploadedFiles(files: unknown): { matrix: UploadedFile; input: UploadedFile | null } {
  const f = (files ?? {}) as Record<string, UploadedFile[] | undefined>;
  const matrix = f.matrix?.[0];
  if (!matrix) throw new InvalidError('Attach the coupling matrix as the file field "matrix" (multipart/form-data)', [{ path: "matrix", message: "Choose a matrix file" }]);
  return { matrix, input: f.input?.[0] ?? null };
}
