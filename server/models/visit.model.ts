import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type NonAttribute, type Sequelize } from 'sequelize';
import type { Site } from './site.model';
import type { User } from './user.model';
import type { VisitDecision } from './visit-decision.model';

/** One person's time at one site, from arrival to the end-of-visit decisions. Ended visits are fixed by trigger. */
export class Visit extends Model<InferAttributes<Visit>, InferCreationAttributes<Visit>> {
  declare id: CreationOptional<number>;
  declare organisationId: number;
  declare siteId: number;
  declare userId: number;
  declare purpose: string;
  declare jobReference: string;
  declare startedAt: Date;
  declare endedAt: CreationOptional<Date | null>;
  declare endNote: CreationOptional<string | null>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
  declare site?: NonAttribute<Site>;
  declare user?: NonAttribute<User>;
  declare decisions?: NonAttribute<VisitDecision[]>;

  static initModel(sequelize: Sequelize) {
    Visit.init(
      {
        id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
        organisationId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
        siteId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
        userId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
        purpose: { type: DataTypes.TEXT, allowNull: false },
        jobReference: { type: DataTypes.STRING(80), allowNull: false, defaultValue: '' },
        startedAt: { type: DataTypes.DATE(3), allowNull: false },
        endedAt: { type: DataTypes.DATE(3), allowNull: true },
        endNote: { type: DataTypes.TEXT, allowNull: true },
        createdAt: DataTypes.DATE(3),
        updatedAt: DataTypes.DATE(3),
      },
      { sequelize, tableName: 'visits', underscored: true },
    );
  }
}
