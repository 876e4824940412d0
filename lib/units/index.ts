/**
 * lib/units: the only bridge between mathjs quantities and SI numbers. Takes the mathjs instance as an
 * argument (it is created in lib/language); imports nothing but mathjs types.
 */
export { installUnits } from "./install.js";
export { installOffsetPolicy, containsOffset } from "./arithmetic.js";
export { installOffsetConversion } from "./offsetTo.js";
export { ADDED_UNITS, type AddedUnit, R_GAS, ATM_PA, PSI_PA } from "./catalog.js";
export { DIMENSIONS, type Dimension, type DimensionName, dimensionOf, hasDimension, isDimensionName } from "./dimensions.js";
export { toSI, scalarSI, fromSI, fromSIArray, describeValue } from "./convert.js";
export { per_mass, per_mole } from "./basis.js";
export { formatQuantity, chooseUnit, chooseUnitName, DISPLAY_CANDIDATES, CANDIDATE_SI_FACTORS, type FormatOptions } from "./format.js";
export { cancelUnits } from "./simplify.js";
export { simplifyForDisplay } from "./displayForm.js";
export { isOffsetQuantity, isUnitValue, absoluteOf } from "./offset.js";
export { installParseCache, PARSE_CACHE_LIMIT } from "./parseCache.js";
export { UnitsError, type UnitsErrorCode } from "./errors.js";
