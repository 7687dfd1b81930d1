import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type NonAttribute, type Sequelize } from 'sequelize';
import type { EnergySource } from '@/shared/rules/register';
import type { ReleaseCheck, TagKind, TagStatus } from '@/shared/rules/tags';
import type { OmittedSource } from '@/shared/rules/tag-isolation';
import type { TagProof } from './tag-proof.model';
import type { TagPoint } from './tag-point.model';
import type { User } from './user.model';

export class Tag extends Model<InferAttributes<Tag>, InferCreationAttributes<Tag>> {
  declare id: CreationOptional<number>;
  declare organisationId: number;
  declare assetId: number;
  declare kind: TagKind;
  declare status: CreationOptional<TagStatus>;
  declare reason: string;
  declare raisedById: number;
  /** Whoever holds the tag now: the raiser until someone takes it over. */
  declare holderId: number;
  declare raisedAt: Date;
  declare expiresAt: Date;
  declare contactPhone: string;
  declare lockNumber: string;
  declare energySources: EnergySource[];
  declare normalState: string;
  declare leftState: string;
  declare clearedAt: CreationOptional<Date | null>;
  declare clearedById: CreationOptional<number | null>;
  declare clearance: CreationOptional<'normal' | 'in-absence' | null>;
  declare checks: CreationOptional<Partial<Record<ReleaseCheck, boolean>> | null>;
  declare idempotencyKey: string | null;
  /** Fingerprint of the raise request, so a replayed key with a different body or item is refused. */
  declare requestHash: string | null;
  declare omittedSources: CreationOptional<OmittedSource[] | null>;
  /** An open hand-over offer (cleared on acceptance or withdrawal; lapsed once offerLapsesAt has passed). */
  declare offerToId: CreationOptional<number | null>;
  declare offerNote: CreationOptional<string | null>;
  declare offeredAt: CreationOptional<Date | null>;
  declare offerLapsesAt: CreationOptional<Date | null>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
  declare points?: NonAttribute<TagPoint[]>;
  declare holder?: NonAttribute<User>;
  declare raisedBy?: NonAttribute<User>;
  declare clearedBy?: NonAttribute<User | null>;
  declare offerTo?: NonAttribute<User | null>;
  declare proofs?: NonAttribute<TagProof[]>;

  static initModel(sequelize: Sequelize) {
    Tag.init(
      {
        id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
        organisationId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
        assetId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
        kind: { type: DataTypes.STRING(20), allowNull: false },
        status: { type: DataTypes.STRING(20), allowNull: false, defaultValue: 'live' },
        reason: { type: DataTypes.TEXT, allowNull: false },
        raisedById: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
        holderId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
        raisedAt: { type: DataTypes.DATE(3), allowNull: false },
        expiresAt: { type: DataTypes.DATE(3), allowNull: false },
        contactPhone: { type: DataTypes.STRING(40), allowNull: false, defaultValue: '' },
        lockNumber: { type: DataTypes.STRING(60), allowNull: false, defaultValue: '' },
        energySources: { type: DataTypes.JSON, allowNull: false },
        normalState: { type: DataTypes.STRING(300), allowNull: false, defaultValue: '' },
        leftState: { type: DataTypes.STRING(300), allowNull: false, defaultValue: '' },
        clearedAt: { type: DataTypes.DATE(3), allowNull: true },
        clearedById: { type: DataTypes.INTEGER.UNSIGNED, allowNull: true },
        clearance: { type: DataTypes.STRING(20), allowNull: true },
        checks: { type: DataTypes.JSON, allowNull: true },
        idempotencyKey: { type: DataTypes.STRING(100), allowNull: true },
        requestHash: { type: DataTypes.CHAR(64), allowNull: true },
        omittedSources: { type: DataTypes.JSON, allowNull: true },
        offerToId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: true },
        offerNote: { type: DataTypes.TEXT, allowNull: true },
        offeredAt: { type: DataTypes.DATE(3), allowNull: true },
        offerLapsesAt: { type: DataTypes.DATE(3), allowNull: true },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'tags', underscored: true },
    );
  }
}
