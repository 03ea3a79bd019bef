// Finite-N Kac–Rice expectations of the Gaussian field network and the theory columns of a cell.
export { kacRiceRow, kacRicePoint, KAC_RICE_STREAM } from "./monte-carlo";
export type { KacRiceRowOptions, KacRicePointResult } from "./monte-carlo";
export { exactTotalKacRice, EXACT_TOTAL_MAX_N } from "./exact-total";
export type { ExactTotalOptions } from "./exact-total";
export { theoryColumns, theoryColumnsRow, EXACT_TOTAL_COLUMN_MAX_N } from "./columns";
export type { KacRiceSettings, TheoryRowInput } from "./columns";
export { shiftDecomposition } from "./shift-decomposition";
