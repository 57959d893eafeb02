import "server-only";
import fs from "node:fs/promises";
import path from "node:path";
import { randomUUID } from "node:crypto";
import { fileTypeFromBuffer } from "file-type";
import { imageSize } from "image-size";
import { checkPng } from "@/lib/images/complete-png";
import { writeTransaction } from "@/lib/db";
import { databaseReady } from "@/lib/data/database";
import { recordAudit } from "@/lib/data/audit";
import { uploadsDir } from "@/lib/env";
import { assertAllowed, canManageClub, type Actor } from "@/lib/auth/permissions";
import { Club } from "@/models";

export type ClubLogoType = "image/png" | "image/jpeg";
export const clubLogoTypes: readonly ClubLogoType[] = ["image/png", "image/jpeg"];
export const maxClubLogoBytes = 2 * 1024 * 1024;

/** A stored file name: our own random names only, so no path can be smuggled in through the database. */
const storedNamePattern = /^[A-Za-z0-9][A-Za-z0-9._-]{0,119}$/;

function logoPath(fileName: string): string | null {
  if (!storedNamePattern.test(fileName) || fileName.includes("..")) return null;
  return path.join(uploadsDir(), fileName);
}

/**
 * Whether each stored PNG logo decodes whole, by file name: a stored file is never rewritten (a new logo
 * gets a new name), so each is decoded once per process, not once per certificate.
 */
const completePngLogos = new Map<string, boolean>();

function isCompletePngLogo(fileName: string, bytes: Uint8Array): boolean {
  let complete = completePngLogos.get(fileName);
  if (complete === undefined) {
    let size: { width?: number; height?: number } = {};
    try {
      size = imageSize(bytes);
    } catch {
      // No readable header: damaged.
    }
    complete = checkPng(bytes, size.width ?? 0, size.height ?? 0) === "complete";
    if (!complete) console.warn(`Club logo ${fileName} is a damaged PNG; certificates print without it until it is replaced.`);
    completePngLogos.set(fileName, complete);
  }
  return complete;
}

/**
 * The club's logo for certificates and pages, or null when there is none (or the file is missing, not
 * a PNG or JPEG (the type is sniffed from the bytes, whatever the name says), or a PNG that does not
 * decode whole: uploads are checked, but a logo stored before that check could stall every PDF).
 */
export async function readClubLogo(clubId: number): Promise<{ bytes: Uint8Array; type: ClubLogoType } | null> {
  await databaseReady();
  const club = await Club.findByPk(clubId, { attributes: ["id", "logoFile"] });
  const fileName = club?.logoFile;
  const file = fileName ? logoPath(fileName) : null;
  if (!fileName || !file) return null;
  let bytes: Uint8Array;
  try {
    bytes = new Uint8Array(await fs.readFile(file));
  } catch {
    return null;
  }
  const type = (await fileTypeFromBuffer(bytes))?.mime;
  if (type === "image/png") return isCompletePngLogo(fileName, bytes) ? { bytes, type } : null;
  return type === "image/jpeg" ? { bytes, type } : null;
}

/** An admin replaces the club's logo with bytes already sniffed as PNG or JPEG (at most 2 MB). */
export async function storeClubLogo(actor: Actor, bytes: Uint8Array, type: ClubLogoType): Promise<void> {
  await databaseReady();
  assertAllowed(canManageClub(actor, actor.clubId), "Only club administrators can change the logo.");
  const fileName = `logo-${randomUUID()}.${type === "image/png" ? "png" : "jpg"}`;
  const target = path.join(uploadsDir(), fileName);
  await fs.writeFile(target, bytes, { flag: "wx", mode: 0o600 });
  let previous: string | null = null;
  try {
    await writeTransaction(async (transaction) => {
      const club = await Club.findByPk(actor.clubId, { transaction });
      if (!club) throw new Error("club missing");
      previous = club.logoFile ?? null;
      await club.update({ logoFile: fileName }, { transaction });
      await recordAudit(
        {
          clubId: actor.clubId,
          actorId: actor.id,
          action: "club.logo-changed",
          subjectType: "club",
          subjectId: actor.clubId,
          details: { type, bytes: bytes.byteLength },
        },
        transaction,
      );
    });
  } catch (error) {
    await fs.rm(target, { force: true });
    throw error;
  }
  await removeLogoFile(previous);
}

/** An admin removes the logo; certificates then show the club's name alone. */
export async function removeClubLogo(actor: Actor): Promise<void> {
  await databaseReady();
  assertAllowed(canManageClub(actor, actor.clubId), "Only club administrators can change the logo.");
  let previous: string | null = null;
  await writeTransaction(async (transaction) => {
    const club = await Club.findByPk(actor.clubId, { transaction });
    previous = club?.logoFile ?? null;
    if (!club || !previous) return;
    await club.update({ logoFile: null }, { transaction });
    await recordAudit(
      {
        clubId: actor.clubId,
        actorId: actor.id,
        action: "club.logo-removed",
        subjectType: "club",
        subjectId: actor.clubId,
      },
      transaction,
    );
  });
  await removeLogoFile(previous);
}

async function removeLogoFile(fileName: string | null): Promise<void> {
  const file = fileName ? logoPath(fileName) : null;
  if (file) await fs.rm(file, { force: true });
}
