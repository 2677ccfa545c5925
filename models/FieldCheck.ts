import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize';

/**
 * One measurement at one bracket (girder point of an exterior girder), with the computed values it was
 * compared with and the verdict. Append-only: a correction is a new check that supersedes the old one.
 * Lengths in the bridge's unit; deviations are measured − computed.
 */
export class FieldCheck extends Model<InferAttributes<FieldCheck>, InferCreationAttributes<FieldCheck>> {
  declare id: CreationOptional<number>;
  declare bridgeId: number;
  /** The geometry revision whose offset table supplied the computed values. */
  declare revision: number;
  declare span: number;
  declare girder: string;
  declare point: number;
  declare side: string;
  declare station: number;
  declare measuredEdgeWidth: number | null;
  declare computedEdgeWidth: number | null;
  declare widthDeviation: number | null;
  declare widthTolerance: number;
  declare widthPass: boolean | null;
  declare measuredReading: number | null;
  declare computedReading: number | null;
  declare readingDeviation: number | null;
  declare readingTolerance: number;
  declare readingPass: boolean | null;
  declare pass: boolean;
  declare note: string;
  /** The earlier check at the same bracket that this one corrects (null for the first). */
  declare supersedesId: number | null;
  /** The field screen's key for one typed measurement; a resend with the same key is not recorded twice. */
  declare clientKey: CreationOptional<string | null>;
  declare userId: number | null;
  declare createdAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize): void {
    FieldCheck.init(
      {
        id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
        bridgeId: { type: DataTypes.INTEGER, allowNull: false, field: 'bridge_id' },
        revision: { type: DataTypes.INTEGER, allowNull: false },
        span: { type: DataTypes.INTEGER, allowNull: false },
        girder: { type: DataTypes.STRING(60), allowNull: false },
        point: { type: DataTypes.INTEGER, allowNull: false },
        side: { type: DataTypes.STRING(10), allowNull: false },
        station: { type: DataTypes.DOUBLE, allowNull: false },
        measuredEdgeWidth: { type: DataTypes.DOUBLE, allowNull: true, field: 'measured_edge_width' },
        computedEdgeWidth: { type: DataTypes.DOUBLE, allowNull: true, field: 'computed_edge_width' },
        widthDeviation: { type: DataTypes.DOUBLE, allowNull: true, field: 'width_deviation' },
        widthTolerance: { type: DataTypes.DOUBLE, allowNull: false, field: 'width_tolerance' },
        widthPass: { type: DataTypes.BOOLEAN, allowNull: true, field: 'width_pass' },
        measuredReading: { type: DataTypes.DOUBLE, allowNull: true, field: 'measured_drop_from_girder_top' },
        computedReading: { type: DataTypes.DOUBLE, allowNull: true, field: 'computed_drop_from_girder_top' },
        readingDeviation: { type: DataTypes.DOUBLE, allowNull: true, field: 'reading_deviation' },
        readingTolerance: { type: DataTypes.DOUBLE, allowNull: false, field: 'reading_tolerance' },
        readingPass: { type: DataTypes.BOOLEAN, allowNull: true, field: 'reading_pass' },
        pass: { type: DataTypes.BOOLEAN, allowNull: false },
        note: { type: DataTypes.STRING(500), allowNull: false, defaultValue: '' },
        supersedesId: { type: DataTypes.INTEGER, allowNull: true, field: 'supersedes_id' },
        clientKey: { type: DataTypes.STRING(64), allowNull: true, field: 'client_key' },
        userId: { type: DataTypes.INTEGER, allowNull: true, field: 'user_id' },
        createdAt: { type: DataTypes.DATE, field: 'created_at' },
      },
      { sequelize, tableName: 'field_checks', updatedAt: false },
    );
  }
}
