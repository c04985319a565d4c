import { EntityManager } from 'typeorm';
import { Shop } from '../entities/shop.entity';

/** The invented workshop of the demo scenario. */
export async function seedDemoWorkshop(manager: EntityManager): Promise<void> {
  await manager.getRepository(Shop).insert({
    name: 'Kestrel Lane Suspension Works',
    address: '14 Tannery Row, Millbrook MB4 7QE',
    email: 'workshop@kestrel-lane.test',
    phone: '+00 555 0142',
    currency: 'EUR',
  });
}
