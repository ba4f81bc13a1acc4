import { uploadLimits } from "@spanwright/contracts";
import type { RequestHandler } from "express";
import multer from "multer";
import { AppError } from "../http/appError.js";

/**
 * One uploaded file, read into memory (multer memoryStorage: files are small and never touch the
 * disk), with limits enforced while the body streams in. Over the size limit: 413
 * `file-too-large`; anything not a single file in the field `file`: 422 `invalid-file`.
 */
export interface UploadedFile {
  originalName: string;
  mimeType: string;
  /** Decoded UTF-8 text, BOM removed. */
  text: string;
}

export type UploadKind = "json" | "csv";

// Browsers label the same file differently (Windows sends .csv as application/vnd.ms-excel);
// the extension or a listed type is enough, since the content is checked after reading.
const accepted: Record<UploadKind, { extension: RegExp; types: readonly string[] }> = {
  json: { extension: /\.json$/i, types: ["application/json", "text/json"] },
  csv: { extension: /\.(csv|txt)$/i, types: ["text/csv", "application/csv", "text/plain", "application/vnd.ms-excel"] },
};

// multipart framing around the file: boundaries, part headers and a few small text fields
const MULTIPART_OVERHEAD = 64 * 1024;

function multerError(error: unknown): AppError {
  if (error instanceof multer.MulterError) {
    if (error.code === "LIMIT_FILE_SIZE") {
      return new AppError("file-too-large", `the file is over ${uploadLimits.fileBytes} bytes; nothing was saved`, { limit: uploadLimits.fileBytes });
    }
    return new AppError("invalid-file", `send one file in the field "${uploadLimits.fieldName}" (${error.message})`);
  }
  if (error instanceof AppError) return error;
  return new AppError("invalid-file", "the upload is not well-formed multipart/form-data");
}

/** Refuses a body whose declared length is already over the limit without reading it in. */
const refuseDeclaredTooLarge: RequestHandler = (req, _res, next) => {
  const declared = Number(req.headers["content-length"] ?? 0);
  if (declared > uploadLimits.fileBytes + MULTIPART_OVERHEAD) {
    req.resume(); // discard the rest so the client can read the answer
    return next(new AppError("file-too-large", `the upload is over ${uploadLimits.fileBytes} bytes; nothing was saved`, { limit: uploadLimits.fileBytes }));
  }
  next();
};

export function uploadOne(kind: UploadKind): RequestHandler[] {
  const parse = multer({
    storage: multer.memoryStorage(),
    limits: { fileSize: uploadLimits.fileBytes, files: uploadLimits.files, fields: 5, fieldSize: 1024, parts: 6 },
    fileFilter: (_req, file, done) => {
      const rule = accepted[kind];
      if (rule.extension.test(file.originalname) || rule.types.includes(file.mimetype.toLowerCase())) return done(null, true);
      done(new AppError("invalid-file", `expected a ${kind.toUpperCase()} file, got "${file.originalname}" (${file.mimetype})`));
    },
  }).single(uploadLimits.fieldName);
  const guarded: RequestHandler = (req, res, next) => {
    parse(req, res, (error?: unknown) => (error ? next(multerError(error)) : next()));
  };
  return [refuseDeclaredTooLarge, guarded];
}

/** The uploaded file as text; 422 `invalid-file` when missing, empty, binary or not UTF-8. */
export function readUpload(file: Express.Multer.File | undefined): UploadedFile {
  if (!file) throw new AppError("invalid-file", `send the file as multipart/form-data in the field "${uploadLimits.fieldName}"`);
  if (file.size === 0) throw new AppError("invalid-file", "the file is empty");
  let text: string;
  try {
    text = new TextDecoder("utf-8", { fatal: true }).decode(file.buffer);
  } catch {
    throw new AppError("invalid-file", "the file is not UTF-8 text");
  }
  if (text.includes("\u0000")) throw new AppError("invalid-file", "the file is binary, not text");
  return { originalName: file.originalname, mimeType: file.mimetype, text: text.replace(/^\uFEFF/, "") };
}
