/** The trade's cautions, carried with every result. */
export const CAUTIONS: readonly string[] = [
  "These figures are estimates from a model and from the crew's own gear data; they are not a guarantee that a rig is safe.",
  "Verify tensions with a load cell on the rig itself; do not rely on these numbers alone.",
  "Backups and redundancy are required in every part of the system: a single failure must never drop the line or the walker.",
  "The leash-fall and backup-catch figures ignore damping and the give of leash and harness: they are an upper bound, not a measurement, and say nothing about bounce or repeated falls.",
  "Ground clearance is worked out from the ground the crew entered and a model of the fall; a swing into an edge or a wall is not modelled. Keep well clear of the ground and of ledges.",
  "Follow the slackline standards in force where you rig (for example DIN 79400 for slackline systems and the International Slackline Association's highline-systems standard), and defer to local rules, land managers and qualified, trained riggers.",
  "Inspect all gear before use; worn, cut or UV-damaged webbing and slings lose strength that no calculation can see.",
];
