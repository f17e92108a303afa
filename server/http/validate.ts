// Route middleware: replaces req.body with the schema's parsed output or answers 400.
import type { RequestHandler } from 'express';
import type { z } from 'zod';
import { parseOr400 } from './zod-fields.ts';

/** Validate the JSON body with `schema`; handlers then read the parsed, typed `req.body`. */
export function validate(schema: z.ZodType): RequestHandler {
  return (req, _res, next) => {
    // A missing body is an empty object so "email is required" names the field.
    req.body = parseOr400(schema, req.body ?? {});
    next();
  };
}
