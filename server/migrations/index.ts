import { CreateShop1764633600000 } from './1764633600000-create-shop';

/** Every migration in the order it runs; a new one is appended here. */
export const migrations = [CreateShop1764633600000];
