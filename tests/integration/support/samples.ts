// Invented rows of each kind, valid by the schemas, for suites that need one to work on.

// Invented gear of every kind, with specs inside the ranges the schema allows.
export const MODELS = {
  webbing: {
    name: "Test tubular 25",
    specs: {
      widthMm: 25,
      massPerMetreG: 45,
      mbsKN: 30,
      stretchPoints: [
        { tensionKN: 0, elongationPct: 0 },
        { tensionKN: 5, elongationPct: 4 },
      ],
    },
  },
  rope: {
    name: "Test static 11",
    specs: {
      diameterMm: 11,
      construction: "static",
      mbsKN: 32,
      massPerMetreG: 80,
      stretchPoints: [
        { tensionKN: 0, elongationPct: 0 },
        { tensionKN: 1, elongationPct: 1.2 },
      ],
    },
  },
  brake: { name: "Test cam brake", specs: { minRopeMm: 9, maxRopeMm: 12, mbsKN: 20 } },
  line_grip: { name: "Test line grip", specs: { minRopeMm: 10, maxRopeMm: 11, mbsKN: 15 } },
  pulley: { name: "Test pulley 50", specs: { sheaveDiameterMm: 50, efficiency: 0.92, mbsKN: 36 } },
  connector: { name: "Test shackle", specs: { mbsKN: 45 } },
  sling: { name: "Test sling 120", specs: { mbsKN: 40 } },
  other: { name: "Test tree pad", specs: {} },
} as const;

// An invented site with a measured span, a ground profile and both anchors described.
export const SITE = {
  name: "Test gorge",
  accessNotes: "",
  spanM: 60,
  heightDifferenceM: 1,
  measuredBy: "laser",
  uncertaintyM: 0.3,
  ground: {
    kind: "profile",
    points: [
      { xM: 0, heightM: -5 },
      { xM: 30, heightM: -40 },
      { xM: 60, heightM: -4 },
    ],
  },
  anchors: { a: { kind: "bolts", boltCount: 2, boltSizeMm: 12, notes: "" }, b: { kind: "tree", trunkDiameterCm: 55, notes: "" } },
  coordinates: { latitude: 46.5, longitude: 8.1 },
};
