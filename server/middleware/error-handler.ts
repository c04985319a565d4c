import { ErrorRequestHandler, RequestHandler } from 'express';
import { HttpError, NotFoundError } from '../errors';

interface FrameworkError {
  type?: string;
  status?: number;
  /** http-errors sets it on a 4xx: the client's fault, safe to answer as such. */
  expose?: boolean;
  errno?: number;
}

/**
 * The errors a client can cause in Express's own layers, before any handler runs. The body parsers
 * give most a `type`; two come without one: a path parameter with a broken percent-escape (the
 * router's URIError, marked 400) and a body that does not decompress under its Content-Encoding
 * (zlib's error, which body-parser marks 400). Any other 4xx they mark stays a 4xx.
 */
function fromFrameworkError(err: FrameworkError): HttpError | undefined {
  switch (err.type) {
    case 'entity.parse.failed':
      return new HttpError(400, 'malformed-json', 'The request body is not valid JSON.');
    case 'entity.too.large':
      return new HttpError(413, 'too-large', 'The request body is too large.');
    case 'encoding.unsupported':
    case 'charset.unsupported':
      return new HttpError(415, 'unsupported-encoding', 'The request body has an unsupported encoding.');
  }
  if (err instanceof URIError && err.status === 400) return new HttpError(400, 'malformed-url', 'The address has a broken percent-escape (%).');
  if (!err.expose || !err.status || err.status < 400 || err.status > 499) return undefined;
  if (err.type === undefined && err.errno !== undefined) return new HttpError(400, 'malformed-body', 'The request body does not decompress as its Content-Encoding says.');
  return new HttpError(err.status, 'bad-request', 'The request could not be read.');
}

export const apiNotFound: RequestHandler = (req, _res, next) => {
  next(new NotFoundError(`No API route ${req.method} ${req.path}.`));
};

export function apiErrorHandler(log: (message: string, err: unknown) => void): ErrorRequestHandler {
  return (err, _req, res, next) => {
    if (res.headersSent) return next(err);
    const known = err instanceof HttpError ? err : fromFrameworkError(err ?? {});
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

/**
 * Outside /api (the web app's files and its history fallback): a short plain-text page, never
 * Express's default page, which shows the stack and the server's paths outside production.
 */
export function pageErrorHandler(log: (message: string, err: unknown) => void): ErrorRequestHandler {
  return (err, _req, res, next) => {
    if (res.headersSent) return next(err);
    const known = err instanceof HttpError ? err : fromFrameworkError(err ?? {});
    if (!known) log('unexpected error', err);
    res
      .status(known?.status ?? 500)
      .type('text')
      .send(known?.message ?? 'Something went wrong on the server.');
  };
}
