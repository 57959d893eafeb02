import "server-only";
import fs from "node:fs/promises";
import path from "node:path";
import { randomUUID } from "node:crypto";
import nodemailer from "nodemailer";
import { isDemoMail, outboxDir } from "@/lib/env";
import { outboxMessageId } from "@/lib/mail/outbox-names";

export interface OutgoingMail {
  to: string;
  subject: string;
  text: string;
  /** Optional attachments, e.g. a certificate PDF. */
  attachments?: { filename: string; content: Buffer; contentType: string }[];
}

const fromAddress = process.env.SLIPWAY_MAIL_FROM || "Slipway <no-reply@slipway.invalid>";

/**
 * Sends through SMTP_URL when it is set; otherwise nodemailer's JSON transport writes each message to
 * the outbox folder in the data dir, which admins read in the browser (demo mode).
 */
export async function sendMail(mail: OutgoingMail): Promise<void> {
  if (!isDemoMail()) {
    const transport = nodemailer.createTransport(process.env.SMTP_URL);
    await transport.sendMail({ from: fromAddress, ...mail });
    return;
  }
  const transport = nodemailer.createTransport({ jsonTransport: true });
  const info = await transport.sendMail({ from: fromAddress, ...mail });
  const id = outboxMessageId(new Date(), randomUUID().slice(0, 8));
  const file = path.join(outboxDir(), `${id}.json`);
  await fs.writeFile(file, String(info.message), "utf8");
}
