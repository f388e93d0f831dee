import {
  DataTypes,
  type CreationOptional,
  type InferAttributes,
  type InferCreationAttributes,
  type Model,
} from "sequelize";
import type { ModelEntry } from "./entry";

/** A group of lessons (the lessons themselves live in content/ as MDX). */
export interface ModuleInstance extends Model<InferAttributes<ModuleInstance>, InferCreationAttributes<ModuleInstance>> {
  id: CreationOptional<number>;
  slug: string;
  title: string;
  /** Position in the course, 1-based. */
  order: number;
  createdAt: CreationOptional<Date>;
  updatedAt: CreationOptional<Date>;
}

export const moduleModel: ModelEntry<ModuleInstance> = {
  define: (sequelize) =>
    sequelize.define<ModuleInstance>(
      "Module",
      {
        id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
        slug: { type: DataTypes.STRING(80), allowNull: false, unique: true },
        title: { type: DataTypes.STRING(160), allowNull: false },
        order: { type: DataTypes.INTEGER, allowNull: false },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { tableName: "Modules" },
    ),
};
