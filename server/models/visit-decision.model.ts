import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize';
import type { VisitDecisionAction } from '@/shared/rules/visits';

/** What the engineer decided for one live tag when ending a visit. Append-only (see migration 0011). */
export class VisitDecision extends Model<InferAttributes<VisitDecision>, InferCreationAttributes<VisitDecision>> {
  declare id: CreationOptional<number>;
  declare visitId: number;
  declare tagId: number;
  declare action: VisitDecisionAction;
  declare note: string;
  declare expiresAt: Date | null;
  declare createdAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize) {
    VisitDecision.init(
      {
        id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
        visitId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
        tagId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
        action: { type: DataTypes.STRING(20), allowNull: false },
        note: { type: DataTypes.TEXT, allowNull: false },
        expiresAt: { type: DataTypes.DATE(3), allowNull: true },
        createdAt: DataTypes.DATE(3),
      },
      { sequelize, tableName: 'visit_decisions', underscored: true, updatedAt: false },
    );
  }
}
