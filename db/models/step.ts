import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize';
import type { SpeciesDefinition } from '../../lib/thermo/structure/structure-lookup-type';

/** Every condition field of an engine evaluate request, stored together so the two never drift apart. */
export interface StepConditions {
  temperature?: string;
  standardPressure?: '1 bar' | '1 atm';
  heatCapacity?: boolean;
  pressures?: Record<string, string>;
  concentrations?: Record<string, string>;
  initial?: Record<string, string>;
  /** labels in the equation → { smiles, phase } | { name, phase } | { key } (validated by the route schema) */
  species?: Record<string, SpeciesDefinition>;
  totalPressure?: string;
  electrons?: number;
  /** a saved fit whose ΔH° and ΔS° the step uses instead of the library */
  fitId?: number | null;
}

export class Step extends Model<InferAttributes<Step>, InferCreationAttributes<Step>> {
  declare id: CreationOptional<number>;
  declare routeId: number;
  declare stepKey: string;
  declare sortOrder: number;
  declare equation: string;
  declare conditions: StepConditions;
  declare yieldPct: number;
  declare notes: string;
  declare positionX: number;
  declare positionY: number;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
}

export function initStep(sequelize: Sequelize): typeof Step {
  Step.init(
    {
      id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
      routeId: { type: DataTypes.INTEGER, allowNull: false, field: 'route_id' },
      stepKey: { type: DataTypes.STRING(64), allowNull: false, field: 'step_key' },
      sortOrder: { type: DataTypes.INTEGER, allowNull: false, field: 'sort_order' },
      equation: { type: DataTypes.STRING(500), allowNull: false, defaultValue: '' },
      conditions: { type: DataTypes.JSON, allowNull: false },
      yieldPct: { type: DataTypes.FLOAT, allowNull: false, defaultValue: 100, field: 'yield_pct' },
      notes: { type: DataTypes.TEXT, allowNull: false, defaultValue: '' },
      positionX: { type: DataTypes.FLOAT, allowNull: false, defaultValue: 0, field: 'position_x' },
      positionY: { type: DataTypes.FLOAT, allowNull: false, defaultValue: 0, field: 'position_y' },
      createdAt: { type: DataTypes.DATE, field: 'created_at' },
      updatedAt: { type: DataTypes.DATE, field: 'updated_at' },
    },
    { sequelize, tableName: 'steps', modelName: 'Step' },
  );
  return Step;
}
