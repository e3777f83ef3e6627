export { adaptRecipe, RULE_PIPELINE } from "./adapt-recipe";
export { ADAPT_DEFAULTS, MIN_AXIAL_DEPTH_SHARE, MIN_RADIAL_ENGAGEMENT, YOUNGS_MODULUS_GPA } from "./defaults";
export { RULE_IDS, RULES, type RuleId } from "./rules-meta";
export { WARNING_CODE_LIST, WARNING_CODES, type WarningCode } from "./warning-codes";
