// A server type as an island receives it through fetch and JSON.parse: every Date is a string.
import { z } from 'zod';

/** `T` after a JSON round trip: Date fields (at any depth, nullable or not) become ISO strings. */
export type AsJson<T> = T extends Date ? string : T extends readonly (infer U)[] ? AsJson<U>[] : T extends object ? { [K in keyof T]: AsJson<T[K]> } : T;

/** A schema of the value as sent in JSON: every date (at any depth, nullable or optional) an ISO
 * string, so a table's row schema (drizzle-zod) can describe an answer. Types as `AsJson`. */
export function asJson<S extends z.ZodType>(schema: S): JsonSchemaOf<S> {
  return jsonOf(schema) as JsonSchemaOf<S>;
}

/** The schema `asJson` gives: an object stays an object (so `.pick`, `.extend` work), each field typed as sent. */
export type JsonSchemaOf<S extends z.ZodType> =
  S extends z.ZodObject<infer Shape> ? z.ZodObject<{ [K in keyof Shape]: z.ZodType<AsJson<z.output<Shape[K]>>> }> : z.ZodType<AsJson<z.output<S>>>;

/** The conversion itself, one zod kind at a time (any other kind is sent as it is). */
function jsonOf(schema: z.ZodType): z.ZodType {
  if (schema instanceof z.ZodDate) return z.iso.datetime();
  if (schema instanceof z.ZodNullable) return jsonOf(schema.unwrap() as z.ZodType).nullable();
  if (schema instanceof z.ZodOptional) return jsonOf(schema.unwrap() as z.ZodType).optional();
  if (schema instanceof z.ZodArray) return z.array(jsonOf(schema.element as z.ZodType));
  if (schema instanceof z.ZodObject) return z.object(Object.fromEntries(Object.entries(schema.shape).map(([k, v]) => [k, jsonOf(v as z.ZodType)])));
  return schema;
}
