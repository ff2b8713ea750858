import type { Request } from 'express';
import type { z } from 'zod';
import { AppError, zodFields } from './errors';

/** Parses one part of a request with its schema; a 400 that names every field otherwise. */
export function parse<S extends z.ZodType>(
  schema: S,
  value: unknown,
  what = 'Some fields need attention.',
): z.output<S> {
  const result = schema.safeParse(value);
  if (!result.success) throw new AppError(400, 'invalid_input', what, zodFields(result.error));
  return result.data;
}

export const body = <S extends z.ZodType>(req: Request, schema: S) => parse(schema, req.body ?? {});
export const query = <S extends z.ZodType>(req: Request, schema: S) => parse(schema, req.query);
export const params = <S extends z.ZodType>(req: Request, schema: S) =>
  parse(schema, req.params, 'That address is not valid.');
