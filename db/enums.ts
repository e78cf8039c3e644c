import { pgEnum } from "drizzle-orm/pg-core/columns/enum";
import { OUTCOMES, WORKED } from "../rules/outcomes";
import {
  CHARGES,
  COATING_PERMEABILITIES,
  CRUCIBLES,
  DEFECT_LOCATIONS,
  DEFECT_TYPES,
  DEGASSING_METHODS,
  FOAM_TYPES,
  GATING_POSITIONS,
  MODIFIERS,
  PROCESSES,
  SAND_FEELS,
  SAND_TYPES,
} from "../rules/case";
import { ALLOY_FAMILIES } from "../rules/fact-catalog";
import { RULE_STATUSES } from "../rules/rule-diff";

/**
 * Columns that hold one of a fixed list are PostgreSQL enums made from the same lists the rules and
 * the zod schemas use, so the database refuses a stray value and Drizzle types the column (no casts).
 * A new value is a migration (`npm run db:generate` writes ALTER TYPE ... ADD VALUE).
 */
export const processEnum = pgEnum("process", PROCESSES);
export const chargeEnum = pgEnum("charge", CHARGES);
export const degassingEnum = pgEnum("degassing_method", DEGASSING_METHODS);
export const alloyFamilyEnum = pgEnum("alloy_family", ALLOY_FAMILIES);
export const outcomeEnum = pgEnum("outcome", OUTCOMES);
export const defectTypeEnum = pgEnum("defect_type", DEFECT_TYPES);
export const defectLocationEnum = pgEnum("defect_location", DEFECT_LOCATIONS);
export const workedEnum = pgEnum("worked", WORKED);
export const ruleStatusEnum = pgEnum("rule_status", RULE_STATUSES);
export const temperatureUnitEnum = pgEnum("temperature_unit", ["C", "F"]);
export const lengthUnitEnum = pgEnum("length_unit", ["mm", "in"]);
export const massUnitEnum = pgEnum("mass_unit", ["kg", "lb"]);
export const crucibleEnum = pgEnum("crucible", CRUCIBLES);
export const modifierEnum = pgEnum("modifier", MODIFIERS);
export const sandTypeEnum = pgEnum("sand_type", SAND_TYPES);
export const sandFeelEnum = pgEnum("sand_feel", SAND_FEELS);
export const coatingPermeabilityEnum = pgEnum("coating_permeability", COATING_PERMEABILITIES);
export const foamTypeEnum = pgEnum("foam_type", FOAM_TYPES);
export const gatingPositionEnum = pgEnum("gating_position", GATING_POSITIONS);
