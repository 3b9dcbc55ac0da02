import {
  DataTypes,
  Model,
  type CreationOptional,
  type InferAttributes,
  type InferCreationAttributes,
  type Sequelize,
} from 'sequelize';
import type { User } from './user';

/** A session token (by its JWT id) withdrawn at sign-out, kept until it would have expired. */
export class RevokedSession extends Model<
  InferAttributes<RevokedSession>,
  InferCreationAttributes<RevokedSession>
> {
  declare jti: string;
  declare userId: User['id'];
  declare expiresAt: Date;
  declare createdAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize) {
    RevokedSession.init(
      {
        jti: { type: DataTypes.STRING(64), primaryKey: true },
        userId: { type: DataTypes.UUID, allowNull: false },
        expiresAt: { type: DataTypes.DATE(3), allowNull: false },
        createdAt: DataTypes.DATE(3),
      },
      { sequelize, tableName: 'revoked_sessions', updatedAt: false },
    );
  }
}
