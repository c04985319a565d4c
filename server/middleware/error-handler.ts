import { ErrorRequestHandler, RequestHandler } from 'express';
import { HttpError, NotFoundError } from '../errors';

/** Errors raised by Express's own body parsers carry a `type`; map the ones a client can cause. */
function fromParserError(err: { type?: string; status?: number }): HttpError | undefined {
  switch (err.type) {
    case 'entity.parse.failed':
      return new HttpError(400, 'malformed-json', 'The request body is not valid JSON.');
    case 'entity.too.large':
      return new HttpError(413, 'too-large', 'The request body is too large.');
    case 'encoding.unsupported':
    case 'charset.unsupported':
      return new HttpError(415, 'unsupported-encoding', 'The request body has an unsupported encoding.');
    default:
      return undefined;
  }
}

export const apiNotFound: RequestHandler = (req, _res, next) => {
  next(new NotFoundError(`No API route ${req.method} ${req.path}.`));
};

export function apiErrorHandler(log: (message: string, err: unknown) => void): ErrorRequestHandler {
  return (err, _req, res, next) => {
    if (res.headersSent) return next(err);
    const known = err instanceof HttpError ? err : fromParserError(err ?? {});
    if (known) {
      res.status(known.status).json({
        error: { code: known.code, message: known.message, ...(known.fields ? { fields: known.fields } : {}) },
      });
      return;
    }
    log('unexpected error', err);
    res.status(500).json({ error: { code: 'internal', message: 'Something went wrong on the server.' } });
  };
}
