export { ENGINE_VERSION } from "./version";
export { RigInputError } from "./rig-input-error";
export { SolveError } from "./solve-error";
export {
  STANDARD_GRAVITY,
  toNewtons,
  fromNewtons,
  toMetres,
  fromMetres,
  toKilograms,
  fromKilograms,
  type ForceUnit,
  type LengthUnit,
  type MassUnit,
} from "./units";
export { createStretchCurve, strainAt, tensionAtStrain, pieceAt, type StretchCurve, type StretchPoint } from "./stretch-curve";
export { lineIntegrals, type LineIntegrals } from "./line-integrals";
export { lineEquations, segmentEnds, VARIABLE_NAMES, type Line, type LineVariables, type LineEquation, type VariableName } from "./line-equations";
export { newtonSolve, type NewtonSystem, type NewtonOptions } from "./newton";
export { bracketedRoot } from "./bracketed-root";
export { GAUSS_LOBATTO_5 } from "./gauss-lobatto";
export { checkNumber } from "./check-number";
export { solveEquilibrium } from "./equilibrium";
export { shallowCableGuess, pretensionGuess } from "./shallow-cable";
export { solveLine, describeEquilibrium, checkLine, shortestLength, MAX_SPAN, type LineSolution, type PointLoad } from "./solve-line";
export { lengthForPretension } from "./unstretched-length";
export { pointAtArc, sagAt, lineProfile } from "./line-profile";
export { sweepWalker, type Sweep, type SweepPoint } from "./sweep";
export { leashFallPeak, type LeashFallPeak } from "./leash-fall";
export { lineForceDeflection, type LineForceDeflection, type LoadPathState } from "./line-force-deflection";
export { lineEnergy, strainEnergyDensity } from "./line-energy";
export { catchOnLine, type LineCatch, type CatchHint } from "./line-catch";
export { backupLine, backupFreeFall, backupCatchMissing } from "./backup-catch";
export { checkGround, groundHeightAt, type GroundPoint } from "./ground";
export { lowestClearance, monotoneCubic, RULE_OF_THUMB, DEFAULT_MINIMUM_CLEARANCE_M, type LowestClearance } from "./clearance";
export { analysePulleySystem, checkPulleySystem, type PulleySystem, type PulleyAnalysis, type BrakeLocation } from "./pulley-system";
export { checkBrake, type BrakeCheck, type SlipResult } from "./brake-check";
export { anchorLoads, anchorWarnings, type AnchorLayout, type AnchorLoads } from "./bridle";
export {
  roundTowards,
  atTwelveDigits,
  decimalsOf,
  fixedDigits,
  figureDigits,
  figureText,
  forceUnitOf,
  lengthUnitOf,
  forceIn,
  forceText,
  loadText,
  capacityText,
  capacityDigits,
  lengthText,
  factorText,
  changeText,
  type Rounding,
  type DisplayUnits,
} from "./display";
export {
  safetyFactors,
  COMPONENT_CATEGORIES,
  DEFAULT_MINIMUM_FACTORS,
  type ComponentCategory,
  type LoadedComponent,
  type SafetyFactor,
} from "./safety-factors";
export { detectSlip, type Trace, type SlipOnset } from "./slip-detection";
export { CAUTIONS } from "./cautions";
export { RigInputSchema, DEFAULT_HANG_BELOW_TIE_IN_M, MAX_GROUND_POINTS, MAX_STRETCH_POINTS, type RigInput, type RigInputDraft } from "./rig-schema";
export { parseRigInput } from "./parse-rig-input";
export { rigLine } from "./rig-line";
export { tensionForSag, tensionWithWalker } from "./measured-tension";
export { evaluateRig, type RigResult, type LineState, type AnchorResult, type CatchResult, type ClearanceResult, type WorstClearance } from "./evaluate-rig";
