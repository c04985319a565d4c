/** Saved passes: created per bike (by its rider, or by the desk on the rider's behalf), listed per bike, read one by one. */
import { sizingRecordCreateSchema } from '../../shared/schemas/sizing-record.schema';
import type { AppContext } from '../app-context';
import { currentUser } from '../middleware/auth';
import { SizingRecordInput, SizingRecordsService } from '../services/sizing-records.service';
import { idParam } from './params';
import { anyRole, RouteSpec } from './route-table';
import { parseInput } from './validate';

export function sizingRecordRoutes(ctx: AppContext): RouteSpec[] {
  const records = new SizingRecordsService(ctx);
  return [
    {
      method: 'post',
      path: '/bikes/:id/sizing-records',
      access: anyRole,
      handler: async (req, res) => {
        const id = idParam(req);
        const input = (await parseInput(sizingRecordCreateSchema, req.body)) as SizingRecordInput;
        res.status(201).json({ record: await records.create(currentUser(req), id, input) });
      },
    },
    {
      method: 'get',
      path: '/bikes/:id/sizing-records',
      access: anyRole,
      handler: async (req, res) => {
        res.json({ records: await records.listForBike(currentUser(req), idParam(req)) });
      },
    },
    {
      method: 'get',
      path: '/sizing-records/:id',
      access: anyRole,
      handler: async (req, res) => {
        res.json({ record: await records.get(currentUser(req), idParam(req)) });
      },
    },
  ];
}
