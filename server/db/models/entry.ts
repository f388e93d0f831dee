import type { Model, ModelStatic, Sequelize } from "sequelize";
import type { Models } from "./index";

/** What each model file exports: how to define it on a Sequelize instance, and its associations. */
export interface ModelEntry<M extends Model> {
  define(sequelize: Sequelize): ModelStatic<M>;
  associate?(models: Models): void;
}
