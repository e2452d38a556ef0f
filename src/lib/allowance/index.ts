// The hem-and-cuff allowance engine: exact lengths in, chalk lines and warnings out.
// Pure TypeScript; sums ("31 3/4 + 1/8") are added with fraction.js, so the app never loads mathjs.

export type * from './types';
export { AllowanceError, isAllowanceError, type AllowanceErrorCode } from './allowance-error';
export { formatLength, splitFraction, type SplitFraction } from './format-length';
export { parseLength, withUnitsNamed } from './parse-length';
export { planCuff } from './plan-cuff';
export { planHem } from './plan-hem';
export { checkTaper } from './check-taper';
export { checkHemTaper } from './hem-taper';
export { validateCuffInput, validateHemInput, validateHemTaperInput, validateTaperInput } from './validate-input';
export { DEFAULTS, USUAL_CUFF_DEPTHS, type PlanDefaults, type UsualCuffDepth, type Usual } from './defaults';
export { MM_PER_INCH, UNITS, isUnit, mmToUnit, toInches } from './units';
export { isPrecision } from './read-input';
// The newer kinds of work (issue 17): skirt hems, levelling, sleeves, jeans, waist moves, shrinkage.
export type * from './kind-types';
export type { CautionCode, Note, NoteValue, ShopDefault } from './notes';
export { planFlaredHem, FLARED_HEM_SOURCES } from './flared-hem';
export { KIND_DEFAULTS, KIND_LENGTHS, HEM_EASE_LIMIT, SHRINKAGE_PERCENT, NO_SOURCE, type ShrinkCloth, type KindLengthName } from './kind-defaults';
export { levelHem, HEM_POINTS, LEVEL_HEM_SOURCES } from './level-hem';
export { shortenSleeve, SLEEVE_SOURCES } from './sleeve-shorten';
export { planOriginalHem, ORIGINAL_HEM_SOURCES } from './original-hem';
export { waistMovesHem, WAIST_MOVE_SOURCES } from './waist-move';
export { shrinkAllowance, SHRINK_SOURCES } from './shrink-allowance';
export {
  validateFlaredHemInput,
  validateLevelHemInput,
  validateOriginalHemInput,
  validateShrinkInput,
  validateSleeveInput,
  validateWaistMoveInput,
} from './validate-kinds';
