import "server-only";
import fs from "node:fs/promises";
import path from "node:path";
import { randomUUID } from "node:crypto";
import { writeTransaction } from "@/lib/db";
import { databaseReady } from "@/lib/data/database";
import { assertAllowed, assertVisible, canSignOff, canViewAthlete, type Actor } from "@/lib/auth/permissions";
import { ConflictError, NotFoundError } from "@/lib/http/errors";
import { fileExtensions } from "@/lib/http/upload";
import { uploadsDir } from "@/lib/env";
import { maxEvidencePhotos } from "@/lib/validations/certification";
import { EvidencePhoto, PracticalAssessment, User } from "@/models";
import type { EvidenceMediaType } from "@/models/EvidencePhoto";

export const maxEvidenceBytes = 8 * 1024 * 1024;

function evidenceDir(): string {
  return path.join(uploadsDir(), "evidence");
}

/**
 * Throws unless the actor may add a photo to this sign-off now (a coach of the athlete's club, the
 * sign-off still waiting, fewer than the maximum photos). Route handlers call it before reading the body.
 */
export async function assertCanAddEvidence(actor: Actor, assessmentId: string): Promise<void> {
  await databaseReady();
  const assessment = await PracticalAssessment.findByPk(assessmentId);
  const athlete = assessment ? await User.findByPk(assessment.athleteId) : null;
  assertVisible(!!assessment && !!athlete && canViewAthlete(actor, athlete));
  assertAllowed(canSignOff(actor, athlete), "Only a coach of the club can add evidence to a sign-off.");
  if (assessment.status !== "waiting") throw new ConflictError("This sign-off has already been recorded.");
  const count = await EvidencePhoto.count({ where: { assessmentId } });
  if (count >= maxEvidencePhotos) throw new ConflictError(`A sign-off keeps at most ${maxEvidencePhotos} photos.`);
}

/**
 * Stores a photo whose type was sniffed from its bytes, under a random name in uploadsDir()/evidence
 * (outside public/); the uploader's file name never reaches the file system.
 */
export async function addEvidencePhoto(
  actor: Actor,
  assessmentId: string,
  bytes: Uint8Array,
  mediaType: EvidenceMediaType,
): Promise<{ id: string; url: string; storedName: string }> {
  await assertCanAddEvidence(actor, assessmentId);
  const assessment = (await PracticalAssessment.findByPk(assessmentId))!;
  const id = randomUUID();
  const storedName = `${randomUUID()}.${fileExtensions[mediaType]}`;
  await fs.mkdir(evidenceDir(), { recursive: true });
  const file = path.join(evidenceDir(), storedName);
  await fs.writeFile(file, bytes, { flag: "wx", mode: 0o600 });
  try {
    await writeTransaction(async (transaction) => {
      const count = await EvidencePhoto.count({ where: { assessmentId }, transaction });
      if (count >= maxEvidencePhotos) throw new ConflictError(`A sign-off keeps at most ${maxEvidencePhotos} photos.`);
      await EvidencePhoto.create(
        {
          id,
          clubId: assessment.clubId,
          athleteId: assessment.athleteId,
          assessmentId,
          uploadedById: actor.id,
          storedName,
          mediaType,
          byteSize: bytes.byteLength,
        },
        { transaction },
      );
    });
  } catch (error) {
    await fs.rm(file, { force: true });
    throw error;
  }
  return { id, url: `/api/evidence/${id}`, storedName };
}

/** A photo for its athlete and for coaches and admins of their club; anyone else gets 404. */
export async function readEvidencePhoto(
  actor: Actor,
  photoId: string,
): Promise<{ bytes: Uint8Array; mediaType: EvidenceMediaType; fileName: string }> {
  await databaseReady();
  const photo = /^[0-9a-f-]{36}$/.test(photoId) ? await EvidencePhoto.findByPk(photoId) : null;
  const athlete = photo ? await User.findByPk(photo.athleteId) : null;
  assertVisible(!!photo && !!athlete && canViewAthlete(actor, athlete));
  try {
    const bytes = new Uint8Array(await fs.readFile(path.join(evidenceDir(), path.basename(photo.storedName))));
    return {
      bytes,
      mediaType: photo.mediaType,
      fileName: `evidence-${photo.id}.${fileExtensions[photo.mediaType]}`,
    };
  } catch {
    throw new NotFoundError();
  }
}

/** A coach removes a photo from a sign-off that is still waiting. */
export async function deleteEvidencePhoto(actor: Actor, photoId: string): Promise<void> {
  await databaseReady();
  const photo = await EvidencePhoto.findByPk(photoId);
  const athlete = photo ? await User.findByPk(photo.athleteId) : null;
  assertVisible(!!photo && !!athlete && canViewAthlete(actor, athlete));
  assertAllowed(canSignOff(actor, athlete), "Only a coach of the club can remove evidence.");
  await writeTransaction(async (transaction) => {
    const assessment = await PracticalAssessment.findByPk(photo.assessmentId, { transaction });
    if (assessment?.status !== "waiting") throw new ConflictError("This sign-off has already been recorded.");
    await photo.destroy({ transaction });
  });
  await fs.rm(path.join(evidenceDir(), path.basename(photo.storedName)), { force: true });
}
