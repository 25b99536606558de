import "server-only";
import type { Crew } from "@/db/crews";
import { findRevision, findRig, type Revision, type RigRow } from "@/db/rigs";
import { findSignOff, standingSignOff } from "@/db/reviews";
import { rigCardContent, type RigCardContent } from "./content";

export interface RigCard {
  rig: RigRow;
  revision: Revision;
  content: RigCardContent;
}

/** The address of a revision on the site: what the card's QR code opens. */
export const revisionUrl = (origin: string, rigId: string, revisionId: string) => `${origin}/rigs/${rigId}?revision=${revisionId}`;

/**
 * The card of one revision of a crew's rig, or null when the crew has no such rig or revision. Without a
 * revision it is the rig's signed-off one, else its latest: the one a crew would take to the site.
 */
export async function loadRigCard(crew: Crew, rigId: string, revisionId: string | null, origin: string): Promise<RigCard | null> {
  const rig = await findRig(crew.id, rigId);
  if (!rig) return null;
  const standing = await standingSignOff(crew.id, rig.id);
  const revision = await findRevision(crew.id, rig.id, revisionId ?? standing?.revisionId ?? rig.head.id);
  if (!revision) return null;
  const signOff = standing?.revisionId === revision.id ? standing : await findSignOff(crew.id, revision.id);
  const content = rigCardContent({
    rigName: rig.name,
    siteName: rig.siteName,
    revision,
    signOff,
    standing,
    units: crew.units,
    rigUrl: revisionUrl(origin, rig.id, revision.id),
  });
  return { rig, revision, content };
}
