import { EntityManager } from 'typeorm';
import { writeShopSettings } from '../services/shop-settings.service';

/** The demo workshop's invented terms for quotes. */
export async function seedDemoShopSettings(manager: EntityManager): Promise<void> {
  await writeShopSettings(
    manager,
    {
      labourRateCentsPerHour: 7200,
      taxBasisPoints: 2000,
      deposit: { kind: 'percent', basisPoints: 3000 },
      operations: [
        { code: 'fork-spring-swap', label: 'Fork spring swap', minutes: 60 },
        { code: 'shock-spring-swap', label: 'Shock spring swap', minutes: 45 },
        { code: 'fork-oil', label: 'Fork oil change', minutes: 40 },
        { code: 'sag-setup', label: 'Sag set-up', minutes: 20 },
      ],
      quoteValidityDays: 30,
      cautions:
        'Prices include fitting at the standard times listed. Springs are reserved for you once you accept. The deposit is refunded if the shop cancels; the balance is due at fitting.',
    },
    null,
    new Date(),
  );
}
