import { isAcousticsInputError } from '../../shared/acoustics/errors';
import { runCalc, type Json } from '../../shared/acoustics/calc';
import { errorCodes } from '../../shared/api/errors';
import type { CalcInputs, CalcName } from '../../shared/schemas/calc';
import { ApiError } from '../http/api-error';

export function createCalcService() {
  return {
    /** Runs one calculator; a physically impossible request is the caller's mistake, so a 400 on its field. */
    run<K extends CalcName>(name: K, input: CalcInputs[K]): Json {
      try {
        return runCalc(name, input);
      } catch (err) {
        if (isAcousticsInputError(err)) {
          throw new ApiError(400, errorCodes.validation, err.message, { fields: [{ field: err.field, message: err.message }] });
        }
        throw err;
      }
    },
  };
}
