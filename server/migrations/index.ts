import { CreateShop1764633600000 } from './1764633600000-create-shop';
import { CreateSizingData1764633700000 } from './1764633700000-create-sizing-data';
import { CreateAccounts1764633800000 } from './1764633800000-create-accounts';

/** Every migration in the order it runs; a new one is appended here. */
export const migrations = [CreateShop1764633600000, CreateSizingData1764633700000, CreateAccounts1764633800000];
