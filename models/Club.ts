import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from "sequelize";

export class Club extends Model<InferAttributes<Club>, InferCreationAttributes<Club>> {
  declare id: CreationOptional<number>;
  declare name: string;
  declare slug: string;
  /** Club settings as JSON, validated by clubSettingsSchema when read. */
  declare settings: CreationOptional<Record<string, unknown>>;
  declare logoFile: CreationOptional<string | null>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize): typeof Club {
    Club.init(
      {
        id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
        name: { type: DataTypes.STRING(120), allowNull: false },
        slug: { type: DataTypes.STRING(60), allowNull: false, unique: true },
        settings: { type: DataTypes.JSON, allowNull: false, defaultValue: {} },
        logoFile: { type: DataTypes.STRING(120), allowNull: true },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: "clubs" },
    );
    return Club;
  }
}
