import { SeedRecord } from './seed-record.entity';
import { Shop } from './shop.entity';

export const entities = [Shop, SeedRecord];
