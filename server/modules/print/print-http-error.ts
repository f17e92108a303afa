import { EngineError } from '@shared/pattern/index.ts';
import { HttpError } from '../../http/http-error.ts';
import { PagePlanError } from './page-plan.ts';
import { PrintOptionsError } from './print-options.ts';

/**
 * Maps the print module's input errors to our 400 body (`invalid_input` with fields);
 * anything else is passed through for the error handler's 500.
 */
export function printErrorToHttp(e: unknown): unknown {
  if (e instanceof PrintOptionsError) return new HttpError(400, 'invalid_input', e.message, Object.fromEntries(e.fields.map((f) => [f.field, f.message])));
  if (e instanceof PagePlanError) return new HttpError(400, 'invalid_input', e.message, { [e.field]: e.message });
  // The engine's message already names the field by its label; its path only keys `fields`.
  if (e instanceof EngineError) return new HttpError(400, 'invalid_input', e.message, { [e.field]: e.message });
  return e;
}
