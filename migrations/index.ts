import * as createFoundation from "@/migrations/20261202-0001-create-foundation";
import * as createLearning from "@/migrations/20261202-0002-create-learning";
import * as createFleet from "@/migrations/20261202-0003-create-fleet";
import * as createCertification from "@/migrations/20261202-0004-create-certification";
import * as indexRosterReads from "@/migrations/20261202-0005-index-roster-reads";
import * as certificateReplacement from "@/migrations/20261204-0006-certificate-replacement";
import * as emailChanges from "@/migrations/20261204-0007-email-changes";
import * as emailChangeRequester from "@/migrations/20261204-0008-email-change-requester";

export interface MigrationModule {
  up: typeof createFoundation.up;
  down: typeof createFoundation.down;
}

/** Every migration in order. A static list works alike in the Next server, tsx scripts and vitest. */
export const migrationList: { name: string; module: MigrationModule }[] = [
  { name: "20261202-0001-create-foundation", module: createFoundation },
  { name: "20261202-0002-create-learning", module: createLearning },
  { name: "20261202-0003-create-fleet", module: createFleet },
  { name: "20261202-0004-create-certification", module: createCertification },
  { name: "20261202-0005-index-roster-reads", module: indexRosterReads },
  { name: "20261204-0006-certificate-replacement", module: certificateReplacement },
  { name: "20261204-0007-email-changes", module: emailChanges },
  { name: "20261204-0008-email-change-requester", module: emailChangeRequester },
];
