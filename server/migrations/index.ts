import { CreateShop1764633600000 } from './1764633600000-create-shop';
import { CreateSizingData1764633700000 } from './1764633700000-create-sizing-data';
import { CreateAccounts1764633800000 } from './1764633800000-create-accounts';
import { CatalogueAndStock1764634000000 } from './1764634000000-catalogue-and-stock';
import { RiderFlow1764634100000 } from './1764634100000-rider-flow';
import { ServiceDesk1764634200000 } from './1764634200000-service-desk';
import { AuditShopSettings1764634300000 } from './1764634300000-audit-shop-settings';
import { CatalogueSearchIndexes1764634400000 } from './1764634400000-catalogue-search-indexes';
import { SearchOrderIndexes1764634500000 } from './1764634500000-search-order-indexes';
import { BikeLoadCase1764634600000 } from './1764634600000-bike-load-case';
import { ShopPublicUrl1764634700000 } from './1764634700000-shop-public-url';
import { StockHolds1764634800000 } from './1764634800000-stock-holds';
import { DamperAdjusters1764634900000 } from './1764634900000-damper-adjusters';
import { TestRideLoop1764635000000 } from './1764635000000-test-ride-loop';

/** Every migration in the order it runs; a new one is appended here. */
export const migrations = [CreateShop1764633600000, CreateSizingData1764633700000, CreateAccounts1764633800000, CatalogueAndStock1764634000000, RiderFlow1764634100000, ServiceDesk1764634200000, AuditShopSettings1764634300000, CatalogueSearchIndexes1764634400000, SearchOrderIndexes1764634500000, BikeLoadCase1764634600000, ShopPublicUrl1764634700000, StockHolds1764634800000, DamperAdjusters1764634900000, TestRideLoop1764635000000];
