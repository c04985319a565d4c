import { AuditEntry } from './audit-entry.entity';
import { BikeModel } from './bike-model.entity';
import { Bike } from './bike.entity';
import { MeasuringDraft } from './measuring-draft.entity';
import { RiderProfile } from './rider-profile.entity';
import { SetupLogEntry } from './setup-log-entry.entity';
import { SizingRecord } from './sizing-record.entity';
import { EngineSetting } from './engine-setting.entity';
import { PasswordReset } from './password-reset.entity';
import { SeedRecord } from './seed-record.entity';
import { Shop } from './shop.entity';
import { SpringRate } from './spring-rate.entity';
import { StockMovement } from './stock-movement.entity';
import { ImportBatch } from './import-batch.entity';
import { TargetProfile } from './target-profile.entity';
import { User } from './user.entity';

export const entities = [Shop, SeedRecord, SpringRate, TargetProfile, EngineSetting, User, PasswordReset, StockMovement, ImportBatch, BikeModel, Bike, RiderProfile, MeasuringDraft, SizingRecord, SetupLogEntry, AuditEntry];
