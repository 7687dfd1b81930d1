import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type NonAttribute, type Sequelize } from 'sequelize';
import type { ProofMethod } from '@/shared/rules/tag-isolation';
import type { User } from './user.model';

/** Append-only (migration 0008 triggers): how an isolation was proved, by whom and when. */
export class TagProof extends Model<InferAttributes<TagProof>, InferCreationAttributes<TagProof>> {
  declare id: CreationOptional<number>;
  declare tagId: number;
  declare organisationId: number;
  declare method: ProofMethod;
  declare instrument: string;
  declare reading: string;
  declare note: string;
  declare byId: number;
  declare at: Date;
  declare by?: NonAttribute<User>;

  static initModel(sequelize: Sequelize) {
    TagProof.init(
      {
        id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
        tagId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
        organisationId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
        method: { type: DataTypes.STRING(30), allowNull: false },
        instrument: { type: DataTypes.STRING(120), allowNull: false, defaultValue: '' },
        reading: { type: DataTypes.STRING(60), allowNull: false, defaultValue: '' },
        note: { type: DataTypes.STRING(500), allowNull: false, defaultValue: '' },
        byId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
        at: { type: DataTypes.DATE(3), allowNull: false },
      },
      { sequelize, tableName: 'tag_proofs', underscored: true, timestamps: false },
    );
  }
}
