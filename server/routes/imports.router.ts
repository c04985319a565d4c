/**
 * CSV import of the catalogue: a dry run, then the confirmation with the same file and the dry
 * run's token (see catalogue-import.service.ts), and the list of past imports. The file arrives as
 * multipart/form-data in the field `file`, is held in memory only, and its name is kept as text,
 * never used as a path.
 */
import { Request, Response } from 'express';
import multer, { MulterError } from 'multer';
import { importFormSchema, pageSchema } from '../../shared/schemas/catalogue.schema';
import type { AppContext } from '../app-context';
import { BadRequestError, HttpError, NotFoundError, ValidationError } from '../errors';
import { currentUser } from '../middleware/auth';
import { CatalogueImportService, Upload } from '../services/catalogue-import.service';
import { catalogueStaff } from './catalogue.router';
import { RouteSpec } from './route-table';
import { parseInput } from './validate';

export const UPLOAD_LIMIT_BYTES = 20 * 1024 * 1024;

const CSV_TYPES = new Set(['text/csv', 'application/csv', 'text/x-csv', 'text/comma-separated-values', 'application/vnd.ms-excel']);
/** Types a browser or phone gives a file it does not know; the .csv name decides then. */
const GENERIC_TYPES = new Set(['application/octet-stream', 'text/plain', '']);

const UNSAFE_NAME = /[/\\\u0000-\u001f\u007f]|^\.\.?$/;

/** A name the clerk's device gave; refused when it carries a path, since no honest upload does. */
function checkFileName(name: string): void {
  if (!name.trim() || name.length > 255 || UNSAFE_NAME.test(name)) {
    throw new BadRequestError('The file name must be a plain name like stock.csv, without folders or special characters.', 'bad-file-name');
  }
}

function isCsv(file: Express.Multer.File): boolean {
  const type = file.mimetype.toLowerCase().split(';')[0].trim();
  return CSV_TYPES.has(type) || (GENERIC_TYPES.has(type) && file.originalname.toLowerCase().endsWith('.csv'));
}

const upload = multer({
  storage: multer.memoryStorage(),
  // The full name as sent, so a name with a path is seen and refused rather than silently cut.
  preservePath: true,
  defParamCharset: 'utf8',
  limits: { fileSize: UPLOAD_LIMIT_BYTES, files: 1, fields: 4, fieldSize: 1024, parts: 6 },
  fileFilter: (_req, file, accept) => {
    try {
      checkFileName(file.originalname);
      if (!isCsv(file)) throw new HttpError(415, 'not-csv', `Only CSV files can be imported, not ${file.mimetype || 'this file'}: save it as .csv.`);
      accept(null, true);
    } catch (err) {
      accept(err as Error);
    }
  },
}).single('file');

function uploadError(err: unknown): HttpError {
  if (err instanceof HttpError) return err;
  if (err instanceof MulterError) {
    switch (err.code) {
      case 'LIMIT_FILE_SIZE':
        return new HttpError(413, 'too-large', `The file is larger than ${UPLOAD_LIMIT_BYTES / 1024 / 1024} MB: split it and import the parts one after the other.`);
      case 'LIMIT_UNEXPECTED_FILE':
      case 'LIMIT_FILE_COUNT':
        return new BadRequestError('Send one CSV file, in the form field named "file".', 'unexpected-file');
      default:
        return new BadRequestError(`The upload has more or larger form fields than it should (${err.message}).`, 'bad-upload');
    }
  }
  return new BadRequestError('The upload is not a well-formed multipart/form-data body: send the file again.', 'malformed-upload');
}

/** The uploaded file and the form's fields, or a 4xx saying what is wrong with the upload. */
async function receiveUpload(req: Request, res: Response): Promise<Upload> {
  if (!req.is('multipart/form-data')) {
    throw new HttpError(415, 'not-multipart', 'Upload the CSV file as multipart/form-data, in the form field named "file".');
  }
  await new Promise<void>((resolve, reject) => upload(req, res, (err: unknown) => (err ? reject(uploadError(err)) : resolve())));
  if (!req.file) throw new ValidationError({ file: 'Attach the CSV file in the form field named "file".' }, 'No file was uploaded.');
  return { buffer: req.file.buffer, fileName: req.file.originalname };
}

function batchId(req: Request): number {
  const id = Number(req.params.id);
  if (!Number.isSafeInteger(id) || id < 1) throw new NotFoundError('There is no such import.');
  return id;
}

export function importRoutes(ctx: AppContext): RouteSpec[] {
  const imports = new CatalogueImportService(ctx);
  return [
    {
      method: 'post',
      path: '/imports/dry-run',
      access: catalogueStaff,
      handler: async (req, res) => {
        const file = await receiveUpload(req, res);
        const { unit } = await parseInput(importFormSchema, req.body);
        res.json(await imports.dryRun(file, unit));
      },
    },
    {
      method: 'post',
      path: '/imports',
      access: catalogueStaff,
      handler: async (req, res) => {
        const file = await receiveUpload(req, res);
        const { unit, token } = await parseInput(importFormSchema, req.body);
        if (!token) throw new ValidationError({ token: 'Run the dry run first, check it, and confirm with its token and the same file.' });
        res.status(201).json(await imports.confirm(file, unit, token, currentUser(req).id));
      },
    },
    {
      method: 'get',
      path: '/imports',
      access: catalogueStaff,
      handler: async (req, res) => {
        const { page, pageSize } = await parseInput(pageSchema, req.query);
        res.json(await imports.list(page, pageSize));
      },
    },
    {
      method: 'get',
      path: '/imports/:id',
      access: catalogueStaff,
      handler: async (req, res) => {
        res.json({ batch: await imports.find(batchId(req)) });
      },
    },
  ];
}
