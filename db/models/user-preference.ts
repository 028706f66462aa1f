import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize';
import type { EnergyUnit, PressureUnit, TemperatureUnit } from '../../lib/schemas/preferences';

export class UserPreference extends Model<InferAttributes<UserPreference>, InferCreationAttributes<UserPreference>> {
  declare userId: number;
  declare energyUnit: CreationOptional<EnergyUnit>;
  declare temperatureUnit: CreationOptional<TemperatureUnit>;
  declare pressureUnit: CreationOptional<PressureUnit>;
  declare activeTeamId: CreationOptional<number | null>;
  declare muteReviewRequest: CreationOptional<boolean>;
  declare muteMention: CreationOptional<boolean>;
  declare muteStatusChange: CreationOptional<boolean>;
  declare muteCommentOnOwnedRoute: CreationOptional<boolean>;
  declare cautionCollapsed: CreationOptional<boolean>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
}

export function initUserPreference(sequelize: Sequelize): typeof UserPreference {
  UserPreference.init(
    {
      userId: { type: DataTypes.INTEGER, primaryKey: true, field: 'user_id' },
      energyUnit: { type: DataTypes.STRING(8), allowNull: false, defaultValue: 'kJ', field: 'energy_unit' },
      temperatureUnit: { type: DataTypes.STRING(8), allowNull: false, defaultValue: 'K', field: 'temperature_unit' },
      pressureUnit: { type: DataTypes.STRING(8), allowNull: false, defaultValue: 'bar', field: 'pressure_unit' },
      activeTeamId: { type: DataTypes.INTEGER, allowNull: true, field: 'active_team_id' },
      // E-mail mutes, one per notification kind; the in-app notification is kept either way.
      muteReviewRequest: { type: DataTypes.BOOLEAN, allowNull: false, defaultValue: false, field: 'mute_review_request' },
      muteMention: { type: DataTypes.BOOLEAN, allowNull: false, defaultValue: false, field: 'mute_mention' },
      muteStatusChange: { type: DataTypes.BOOLEAN, allowNull: false, defaultValue: false, field: 'mute_status_change' },
      muteCommentOnOwnedRoute: { type: DataTypes.BOOLEAN, allowNull: false, defaultValue: false, field: 'mute_comment_on_owned_route' },
      // The long safety caution folded to one line once read (the short one always stays).
      cautionCollapsed: { type: DataTypes.BOOLEAN, allowNull: false, defaultValue: false, field: 'caution_collapsed' },
      createdAt: { type: DataTypes.DATE, field: 'created_at' },
      updatedAt: { type: DataTypes.DATE, field: 'updated_at' },
    },
    { sequelize, tableName: 'user_preferences', modelName: 'UserPreference' },
  );
  return UserPreference;
}
