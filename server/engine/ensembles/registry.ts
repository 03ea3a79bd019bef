import type { Ensemble } from "./ensemble";
import { fieldEnsemble } from "./field/field.ensemble";
import { rateEnsemble } from "./rate/rate.ensemble";

/**
 * An ensemble whose parameter and draw types are known only at run time (the sweep machinery
 * passes them through validate/draw/build untouched). `any` because Ensemble is contravariant
 * in its parameter type.
 */
export type AnyEnsemble = Ensemble<any, any>;

/** Every ensemble by id. A new ensemble is one folder plus one line here. */
export const ensembles: Readonly<Record<string, AnyEnsemble>> = Object.freeze({
  [rateEnsemble.id]: rateEnsemble,
  [fieldEnsemble.id]: fieldEnsemble,
});

/** Ids of the registered ensembles, in registration order. */
export const ensembleIds: readonly string[] = Object.freeze(Object.keys(ensembles));

/**
 * Looks up an ensemble by id.
 * @param id ensemble identifier ("rate", "field")
 * @returns the Ensemble (parameters and draws typed loosely; validate() them)
 * @throws RangeError naming the unknown id and listing the known ones
 */
export function getEnsemble(id: string): AnyEnsemble {
  const found = Object.prototype.hasOwnProperty.call(ensembles, id) ? ensembles[id] : undefined;
  if (!found) {
    throw new RangeError(`ensemble must be one of ${ensembleIds.join(", ")}, got ${JSON.stringify(id)}`);
  }
  return found;
}
