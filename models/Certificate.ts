import {
  DataTypes,
  Model,
  type CreationOptional,
  type ForeignKey,
  type InferAttributes,
  type InferCreationAttributes,
  type Sequelize,
} from "sequelize";
import type { Club } from "@/models/Club";
import type { User } from "@/models/User";

export const certificateKinds = ["module", "clearance"] as const;
export type CertificateKind = (typeof certificateKinds)[number];

/**
 * An issued certificate: a module pass, or the rigging clearance. Names, title and dates are copied in
 * at issue so that renaming someone or changing the club's settings never rewrites a certificate.
 */
export class Certificate extends Model<InferAttributes<Certificate>, InferCreationAttributes<Certificate>> {
  declare id: string;
  declare clubId: ForeignKey<Club["id"]>;
  declare athleteId: ForeignKey<User["id"]>;
  declare kind: CertificateKind;
  declare moduleSlug: CreationOptional<string | null>;
  declare assessmentId: CreationOptional<string | null>;
  /** For a clearance certificate: the modules it stands on. */
  declare coveredModules: CreationOptional<string[]>;
  declare serial: string;
  declare serialYear: number;
  declare serialNumber: number;
  declare verificationCode: string;
  declare athleteName: string;
  declare title: string;
  declare signedOffById: CreationOptional<number | null>;
  declare signedOffByName: string;
  /** YYYY-MM-DD */
  declare issuedOn: string;
  /** YYYY-MM-DD, the first day the certificate no longer holds. */
  declare expiresOn: string;
  declare issuedAt: Date;
  declare revokedAt: CreationOptional<Date | null>;
  declare revokedById: CreationOptional<number | null>;
  declare revokeReason: CreationOptional<string | null>;
  /** Set when the certificate was reissued under a corrected name: the id of its replacement. */
  declare replacedById: CreationOptional<string | null>;

  static initModel(sequelize: Sequelize): typeof Certificate {
    Certificate.init(
      {
        id: { type: DataTypes.STRING(36), primaryKey: true },
        clubId: { type: DataTypes.INTEGER, allowNull: false },
        athleteId: { type: DataTypes.INTEGER, allowNull: false },
        kind: {
          type: DataTypes.STRING(16),
          allowNull: false,
          validate: { isIn: [certificateKinds as unknown as string[]] },
        },
        moduleSlug: { type: DataTypes.STRING(60), allowNull: true },
        assessmentId: { type: DataTypes.STRING(36), allowNull: true },
        coveredModules: { type: DataTypes.JSON, allowNull: false, defaultValue: [] },
        serial: { type: DataTypes.STRING(32), allowNull: false },
        serialYear: { type: DataTypes.INTEGER, allowNull: false },
        serialNumber: { type: DataTypes.INTEGER, allowNull: false },
        verificationCode: { type: DataTypes.STRING(32), allowNull: false, unique: true },
        athleteName: { type: DataTypes.STRING(120), allowNull: false },
        title: { type: DataTypes.STRING(160), allowNull: false },
        signedOffById: { type: DataTypes.INTEGER, allowNull: true },
        signedOffByName: { type: DataTypes.STRING(120), allowNull: false },
        issuedOn: { type: DataTypes.DATEONLY, allowNull: false },
        expiresOn: { type: DataTypes.DATEONLY, allowNull: false },
        issuedAt: { type: DataTypes.DATE, allowNull: false },
        revokedAt: { type: DataTypes.DATE, allowNull: true },
        revokedById: { type: DataTypes.INTEGER, allowNull: true },
        revokeReason: { type: DataTypes.TEXT, allowNull: true },
        replacedById: { type: DataTypes.STRING(36), allowNull: true },
      },
      { sequelize, tableName: "certificates", timestamps: false },
    );
    return Certificate;
  }
}
