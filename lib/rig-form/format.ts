import { figureText, lengthText, type Rounding } from "@/physics";
import { toShown, unitLabel, type QuantityKind, type UnitSystem } from "./quantities";

// The planner's figures in the crew's units. How a figure is rounded and to how many decimals is decided once in
// physics/display.ts (a load is `loadText`, a capacity `capacityText`, a factor `factorText`); this module only
// adds the rig input's kinds of quantity and their units.

/** An SI figure of any kind of the rig input in the crew's units with its unit, e.g. "4.39 kN" or "988 lbf". */
export const formatQuantity = (si: number, kind: QuantityKind, units: UnitSystem, rounding: Rounding) =>
  figureText(toShown(si, kind, units), unitLabel(kind, units), rounding);

/** A sag or deflection (m) for display, rounded up: never shown shallower than computed. */
export const formatDepth = (metres: number, units: UnitSystem) => lengthText(metres, units, "up");

/** A position or distance (m) for display, to the nearest shown step. */
export const formatDistance = (metres: number, units: UnitSystem) => lengthText(metres, units, "nearest");

/** A clearance above the ground (m) for display, rounded down: never shown roomier than computed. */
export const formatClearance = (metres: number, units: UnitSystem) => lengthText(metres, units, "down");
