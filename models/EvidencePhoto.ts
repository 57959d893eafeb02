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
import type { PracticalAssessment } from "@/models/PracticalAssessment";

export const evidenceMediaTypes = ["image/jpeg", "image/png", "image/webp"] as const;
export type EvidenceMediaType = (typeof evidenceMediaTypes)[number];

/** A photo a coach took at a practical sign-off, stored in uploadsDir() under a random name. */
export class EvidencePhoto extends Model<InferAttributes<EvidencePhoto>, InferCreationAttributes<EvidencePhoto>> {
  declare id: string;
  declare clubId: ForeignKey<Club["id"]>;
  declare athleteId: ForeignKey<User["id"]>;
  declare assessmentId: ForeignKey<PracticalAssessment["id"]>;
  declare uploadedById: ForeignKey<User["id"]>;
  /** Random file name inside uploadsDir(); the uploader's file name is never used or kept. */
  declare storedName: string;
  /** Sniffed from the bytes, never taken from the upload's headers. */
  declare mediaType: EvidenceMediaType;
  declare byteSize: number;
  declare createdAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize): typeof EvidencePhoto {
    EvidencePhoto.init(
      {
        id: { type: DataTypes.STRING(36), primaryKey: true },
        clubId: { type: DataTypes.INTEGER, allowNull: false },
        athleteId: { type: DataTypes.INTEGER, allowNull: false },
        assessmentId: { type: DataTypes.STRING(36), allowNull: false },
        uploadedById: { type: DataTypes.INTEGER, allowNull: false },
        storedName: { type: DataTypes.STRING(80), allowNull: false, unique: true },
        mediaType: { type: DataTypes.STRING(32), allowNull: false },
        byteSize: { type: DataTypes.INTEGER, allowNull: false },
        createdAt: DataTypes.DATE,
      },
      { sequelize, tableName: "evidence_photos", updatedAt: false },
    );
    return EvidencePhoto;
  }
}
