/** The payment provider's webhook: raw body (mounted before the JSON parser in app.ts), verified signature. */
import type { AppContext } from '../app-context';
import { PaymentsService } from '../services/payments.service';
import { RouteSpec, webhookAccess } from './route-table';

export const PAYMENT_WEBHOOK_PATH = '/payments/webhook';

export function paymentRoutes(ctx: AppContext): RouteSpec[] {
  const payments = new PaymentsService(ctx);
  return [
    {
      method: 'post',
      path: PAYMENT_WEBHOOK_PATH,
      access: webhookAccess,
      handler: async (req, res) => {
        res.json(await payments.handleWebhook(Buffer.isBuffer(req.body) ? req.body : undefined, req.get('stripe-signature')));
      },
    },
  ];
}
