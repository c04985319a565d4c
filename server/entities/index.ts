import { EngineSetting } from './engine-setting.entity';
import { PasswordReset } from './password-reset.entity';
import { SeedRecord } from './seed-record.entity';
import { Shop } from './shop.entity';
import { SpringRate } from './spring-rate.entity';
import { TargetProfile } from './target-profile.entity';
import { User } from './user.entity';

export const entities = [Shop, SeedRecord, SpringRate, TargetProfile, EngineSetting, User, PasswordReset];
