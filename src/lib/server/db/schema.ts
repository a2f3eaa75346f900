import type { ColumnType, Insertable, Selectable, Updateable } from 'kysely';
import type { AuthTables } from './auth-tables';
import type { BankTables } from './bank-tables';

/** Timestamps come back as Date and may be written as Date or ISO string. */
export type Timestamp = ColumnType<Date, Date | string | undefined, Date | string>;

export interface AppSettingTable {
  key: string;
  value: ColumnType<unknown, string, string>;
  updated_at: Timestamp;
}

/** Every table the app reads or writes, by name. */
export interface Database extends AuthTables, BankTables {
  app_setting: AppSettingTable;
}

export type AppSetting = Selectable<AppSettingTable>;
export type NewAppSetting = Insertable<AppSettingTable>;
export type AppSettingUpdate = Updateable<AppSettingTable>;
