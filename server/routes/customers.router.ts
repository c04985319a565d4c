/** The desk's customer search and walk-in accounts; their bikes, weigh-ins and records are the rider routes with ?riderId=. */
import { number, object, string } from 'yup';
import { customerCreateSchema } from '../../shared/schemas/quote.schema';
import type { AppContext } from '../app-context';
import { CustomersService } from '../services/customers.service';
import { RouteSpec, signedIn } from './route-table';
import { parseInput } from './validate';

const searchSchema = object({
  q: string().trim().max(100, 'At most 100 characters.').default(''),
  page: number().typeError('page must be a number.').integer().min(1).default(1),
  pageSize: number().typeError('pageSize must be a number.').integer().min(1).max(100).default(25),
});

export function customerRoutes(ctx: AppContext): RouteSpec[] {
  const customers = new CustomersService(ctx);
  const desk = signedIn('desk', 'admin');
  return [
    {
      method: 'get',
      path: '/customers',
      access: desk,
      handler: async (req, res) => {
        res.json(await customers.search(await parseInput(searchSchema, req.query)));
      },
    },
    {
      method: 'post',
      path: '/customers',
      access: desk,
      handler: async (req, res) => {
        res.status(201).json({ customer: await customers.createWalkIn(await parseInput(customerCreateSchema, req.body)) });
      },
    },
  ];
}
