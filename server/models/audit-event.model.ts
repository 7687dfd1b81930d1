import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize';

export type AuditEventType = 'sign-in' | 'sign-in-failed' | 'sign-out' | 'role-change' | 'user-deactivated' | 'user-reactivated' | 'user-invited' | 'site-access-change' | 'password-reset';

/** Append-only record of security events; rows are never updated or deleted. */
export class AuditEvent extends Model<InferAttributes<AuditEvent>, InferCreationAttributes<AuditEvent>> {
  declare id: CreationOptional<number>;
  declare organisationId: number | null;
  declare userId: number | null;
  declare actorId: number | null;
  declare type: AuditEventType;
  declare detail: CreationOptional<Record<string, unknown> | null>;
  declare ip: string | null;
  declare createdAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize) {
    AuditEvent.init(
      {
        id: { type: DataTypes.BIGINT.UNSIGNED, autoIncrement: true, primaryKey: true },
        organisationId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: true },
        userId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: true },
        actorId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: true },
        type: { type: DataTypes.STRING(40), allowNull: false },
        detail: { type: DataTypes.JSON, allowNull: true },
        ip: { type: DataTypes.STRING(64), allowNull: true },
        createdAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'audit_events', underscored: true, updatedAt: false },
    );
  }
}
