/** Ids and the staff's `riderId` from a request. */
import { Request } from 'express';
import { number, object } from 'yup';
import { NotFoundError } from '../errors';
import { parseInput } from './validate';

/** A path id; anything that cannot be one answers 404, as an unknown id does. */
export function idParam(req: Request, name = 'id'): number {
  const id = Number(req.params[name]);
  if (!Number.isSafeInteger(id) || id < 1) throw new NotFoundError();
  return id;
}

const riderQuerySchema = object({
  riderId: number().integer('The rider id must be a whole number.').positive('The rider id must be a whole number.').optional(),
});

/** `?riderId=`: whose records a desk or admin user acts on; left out, the caller's own. */
export async function riderQuery(req: Request): Promise<number | undefined> {
  return (await parseInput(riderQuerySchema, req.query)).riderId;
}
