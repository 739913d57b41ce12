/**
 * Raised when the inputs to an estimation function cannot give a meaningful answer
 * (a category with no target, a negative share, an infeasible cap). The message names
 * the variable, category or field at fault so a caller can pass it on unchanged.
 */
export class EstimationInputError extends Error {
  override readonly name = 'EstimationInputError';
}
