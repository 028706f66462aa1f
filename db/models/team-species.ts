import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize';

// One species a team added; its key shadows a built-in of the same key for that team's evaluations.
export class TeamSpecies extends Model<InferAttributes<TeamSpecies>, InferCreationAttributes<TeamSpecies>> {
  declare id: CreationOptional<number>;
  declare teamId: number;
  declare key: string;
  declare formula: string;
  declare phase: 'g' | 'l' | 's' | 'aq';
  declare form: string | null;
  declare name: string;
  declare aliases: string[];
  declare elements: Record<string, number>;
  declare charge: number;
  declare dfhKj: number;
  declare dfgKj: number;
  declare dfgDerived: boolean;
  declare sJPerK: number;
  declare cpJPerK: number | null;
  declare cpTminK: number | null;
  declare cpTmaxK: number | null;
  declare sigmaDfhKj: number | null;
  declare sigmaDfgKj: number | null;
  declare sigmaSJPerK: number | null;
  declare provenanceKind: 'citation' | 'measured' | 'estimated';
  declare provenanceText: string;
  declare fitId: number | null;
  declare importId: number | null;
  declare notes: string;
  /** RDKit canonical SMILES, for species known by structure */
  declare smiles: string | null;
  declare inchikey: string | null;
  declare version: CreationOptional<number>;
  declare createdById: number | null;
  declare updatedById: number | null;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
}

export function initTeamSpecies(sequelize: Sequelize): typeof TeamSpecies {
  TeamSpecies.init(
    {
      id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
      teamId: { type: DataTypes.INTEGER, allowNull: false, field: 'team_id' },
      key: { type: DataTypes.STRING(120), allowNull: false },
      formula: { type: DataTypes.STRING(80), allowNull: false },
      phase: { type: DataTypes.STRING(4), allowNull: false },
      form: { type: DataTypes.STRING(40), allowNull: true },
      name: { type: DataTypes.STRING(120), allowNull: false },
      aliases: { type: DataTypes.JSON, allowNull: false },
      elements: { type: DataTypes.JSON, allowNull: false },
      charge: { type: DataTypes.INTEGER, allowNull: false },
      dfhKj: { type: DataTypes.DOUBLE, allowNull: false, field: 'dfh_kj' },
      dfgKj: { type: DataTypes.DOUBLE, allowNull: false, field: 'dfg_kj' },
      dfgDerived: { type: DataTypes.BOOLEAN, allowNull: false, field: 'dfg_derived' },
      sJPerK: { type: DataTypes.DOUBLE, allowNull: false, field: 's_j_per_k' },
      cpJPerK: { type: DataTypes.DOUBLE, allowNull: true, field: 'cp_j_per_k' },
      cpTminK: { type: DataTypes.DOUBLE, allowNull: true, field: 'cp_tmin_k' },
      cpTmaxK: { type: DataTypes.DOUBLE, allowNull: true, field: 'cp_tmax_k' },
      sigmaDfhKj: { type: DataTypes.DOUBLE, allowNull: true, field: 'sigma_dfh_kj' },
      sigmaDfgKj: { type: DataTypes.DOUBLE, allowNull: true, field: 'sigma_dfg_kj' },
      sigmaSJPerK: { type: DataTypes.DOUBLE, allowNull: true, field: 'sigma_s_j_per_k' },
      provenanceKind: { type: DataTypes.STRING(16), allowNull: false, field: 'provenance_kind' },
      provenanceText: { type: DataTypes.TEXT, allowNull: false, field: 'provenance_text' },
      fitId: { type: DataTypes.INTEGER, allowNull: true, field: 'fit_id' },
      importId: { type: DataTypes.INTEGER, allowNull: true, field: 'import_id' },
      notes: { type: DataTypes.TEXT, allowNull: false },
      smiles: { type: DataTypes.STRING(600), allowNull: true },
      inchikey: { type: DataTypes.STRING(27), allowNull: true },
      version: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 1 },
      createdById: { type: DataTypes.INTEGER, allowNull: true, field: 'created_by_id' },
      updatedById: { type: DataTypes.INTEGER, allowNull: true, field: 'updated_by_id' },
      createdAt: { type: DataTypes.DATE, field: 'created_at' },
      updatedAt: { type: DataTypes.DATE, field: 'updated_at' },
    },
    { sequelize, tableName: 'team_species', modelName: 'TeamSpecies' },
  );
  return TeamSpecies;
}
