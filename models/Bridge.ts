import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize';
import type { Units } from '@/lib/units';

export class Bridge extends Model<InferAttributes<Bridge>, InferCreationAttributes<Bridge>> {
  declare id: CreationOptional<number>;
  declare name: string;
  declare units: Units;
  declare currentRevision: number;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
  /** Field-check tolerance on edge width, bridge units; null means the default for the units. */
  declare widthTolerance: CreationOptional<number | null>;
  /** Field-check tolerance on the level-bar reading, bridge units; null means the default. */
  declare readingTolerance: CreationOptional<number | null>;
  /** Shortest level-bar rod on the field sheet, bridge units; null means the default. */
  declare baseRodLength: CreationOptional<number | null>;
  /** The bridge record a district files it by; '' when not given. */
  declare structureNumber: CreationOptional<string>;
  declare route: CreationOptional<string>;
  declare featureCrossed: CreationOptional<string>;
  declare district: CreationOptional<string>;
  declare contractor: CreationOptional<string>;
  /** design, forming, checked or poured (lib/services/bridge-record.ts). */
  declare stage: CreationOptional<string>;
  /** Status counters kept by lib/services/bridge-status.ts whenever checks, sign-offs or geometry change. */
  declare bracketsTotal: CreationOptional<number>;
  declare bracketsPassing: CreationOptional<number>;
  declare openFailures: CreationOptional<number>;
  declare spansTotal: CreationOptional<number>;
  declare spansSignedOff: CreationOptional<number>;
  declare spansAwaitingSignoff: CreationOptional<number>;
  /** Newest check, photo or sign-off; null before any field work. */
  declare lastFieldAt: CreationOptional<Date | null>;
  /** Newest activity of any kind (creation, edits, field work): the portfolio's default order. */
  declare activityAt: CreationOptional<Date>;
  /** Name, structure number and route in lower case, for the portfolio search; set on every save. */
  declare searchText: CreationOptional<string>;

  static initModel(sequelize: Sequelize): void {
    Bridge.init(
      {
        id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
        name: { type: DataTypes.STRING(200), allowNull: false },
        units: { type: DataTypes.STRING(2), allowNull: false },
        currentRevision: { type: DataTypes.INTEGER, allowNull: false, field: 'current_revision' },
        createdAt: { type: DataTypes.DATE, field: 'created_at' },
        updatedAt: { type: DataTypes.DATE, field: 'updated_at' },
        widthTolerance: { type: DataTypes.DOUBLE, allowNull: true, field: 'width_tolerance' },
        readingTolerance: { type: DataTypes.DOUBLE, allowNull: true, field: 'reading_tolerance' },
        baseRodLength: { type: DataTypes.DOUBLE, allowNull: true, field: 'base_rod_length' },
        structureNumber: { type: DataTypes.STRING(40), allowNull: false, defaultValue: '', field: 'structure_number' },
        route: { type: DataTypes.STRING(120), allowNull: false, defaultValue: '' },
        featureCrossed: { type: DataTypes.STRING(200), allowNull: false, defaultValue: '', field: 'feature_crossed' },
        district: { type: DataTypes.STRING(120), allowNull: false, defaultValue: '' },
        contractor: { type: DataTypes.STRING(200), allowNull: false, defaultValue: '' },
        stage: { type: DataTypes.STRING(10), allowNull: false, defaultValue: 'design' },
        bracketsTotal: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0, field: 'brackets_total' },
        bracketsPassing: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0, field: 'brackets_passing' },
        openFailures: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0, field: 'open_failures' },
        spansTotal: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0, field: 'spans_total' },
        spansSignedOff: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0, field: 'spans_signed_off' },
        spansAwaitingSignoff: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0, field: 'spans_awaiting_signoff' },
        lastFieldAt: { type: DataTypes.DATE, allowNull: true, field: 'last_field_at' },
        activityAt: { type: DataTypes.DATE, allowNull: false, defaultValue: DataTypes.NOW, field: 'activity_at' },
        searchText: { type: DataTypes.STRING(400), allowNull: false, defaultValue: '', field: 'search_text' },
      },
      {
        sequelize,
        tableName: 'bridges',
        hooks: {
          beforeSave: (b) => {
            b.searchText = searchTextOf(b.name, b.structureNumber, b.route);
          },
        },
      },
    );
  }
}

/** The search column's text: name, structure number and route, lower case, at most 400 characters. */
export function searchTextOf(name: string, structureNumber: string | undefined, route: string | undefined): string {
  return [name, structureNumber ?? '', route ?? ''].join(' ').toLowerCase().slice(0, 400);
}
