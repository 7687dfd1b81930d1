import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type NonAttribute, type Sequelize } from 'sequelize';
import type { PersonRef } from '@/shared/types/tags';
import type { User } from './user.model';

/** Append-only (migration 0008 triggers): a site's periodic review of its isolation procedure (OSHA 29 CFR 1910.147(c)(6)). */
export class ProcedureReview extends Model<InferAttributes<ProcedureReview>, InferCreationAttributes<ProcedureReview>> {
  declare id: CreationOptional<number>;
  declare organisationId: number;
  declare siteId: number;
  declare reviewedOn: string;
  declare reviewerId: number;
  declare observed: PersonRef[];
  declare deviations: string;
  declare corrections: string;
  declare signedOffAt: Date;
  declare createdAt: CreationOptional<Date>;
  declare reviewer?: NonAttribute<User>;

  static initModel(sequelize: Sequelize) {
    ProcedureReview.init(
      {
        id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
        organisationId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
        siteId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
        reviewedOn: { type: DataTypes.DATEONLY, allowNull: false },
        reviewerId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
        observed: { type: DataTypes.JSON, allowNull: false },
        deviations: { type: DataTypes.TEXT, allowNull: false },
        corrections: { type: DataTypes.TEXT, allowNull: false },
        signedOffAt: { type: DataTypes.DATE(3), allowNull: false },
        createdAt: DataTypes.DATE(3),
      },
      { sequelize, tableName: 'procedure_reviews', underscored: true, updatedAt: false },
    );
  }
}
