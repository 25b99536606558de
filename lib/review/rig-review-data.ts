import "server-only";
import type { UnitSystem } from "@/lib/rig-form/quantities";
import { findRevision, revisionPlace } from "@/db/rigs";
import { standingSignOff, type SignOff } from "@/db/reviews";
import { rigAuditLog, type AuditEntry } from "@/db/audit-log";
import { checklistTemplate } from "@/db/checklists";
import { verifySignOff, type Verification } from "./verification";

export interface RigReviewData {
  signOff: SignOff | null;
  verification: Verification | null;
  auditLog: AuditEntry[];
  hasChecklist: boolean;
  reusedFrom: { rigId: string; rigName: string; number: number } | null;
  /** The anchor where the signed-off plan reads its pretension: where a load cell usually sits. */
  signedReadAt: "a" | "b";
}

/** What the rig's page shows of its review: the standing sign-off checked again, the audit log, and where the rig came from. */
export async function rigReviewData(crewId: string, rig: { id: string; reusedFromRevisionId: string | null }, units: UnitSystem): Promise<RigReviewData> {
  const [signOff, auditLog, template, reusedFrom] = await Promise.all([
    standingSignOff(crewId, rig.id),
    rigAuditLog(crewId, rig.id),
    checklistTemplate(crewId),
    rig.reusedFromRevisionId ? revisionPlace(crewId, rig.reusedFromRevisionId) : null,
  ]);
  const signed = signOff ? await findRevision(crewId, rig.id, signOff.revisionId) : null;
  const verification = signOff && signed ? verifySignOff(signed, signOff.contentHash, units) : null;
  const signedReadAt = (signed?.inputs as { pretension?: { readAt?: "a" | "b" } } | undefined)?.pretension?.readAt ?? "b";
  return { signOff, verification, auditLog, hasChecklist: template.items.length > 0, reusedFrom, signedReadAt };
}
