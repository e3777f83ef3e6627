export { adaptRecipe, RULE_PIPELINE } from "./adapt-recipe";
export {
  ADAPT_DEFAULTS,
  BALL_NOSE_TOLERANCE,
  DIAMETER_RANGE_MM,
  FULL_WIDTH_SHARE,
  MAX_STICKOUT_DIAMETERS,
  MIN_AXIAL_DEPTH_SHARE,
  MIN_RADIAL_ENGAGEMENT,
  PLUNGE_ONLY_DEPTH_SHARE,
  SLOT_DEPTH_SHARE,
  SLOTTING_FACTOR,
  YOUNGS_MODULUS_GPA,
} from "./defaults";
export { RULE_IDS, RULES, type RuleId } from "./rules-meta";
export { WARNING_CODE_LIST, WARNING_CODES, type WarningCode } from "./warning-codes";
