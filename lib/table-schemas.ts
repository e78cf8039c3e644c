import { getTableColumns, type Column, type Table } from "drizzle-orm";
import { createInsertSchema } from "drizzle-zod";
import { z } from "zod";
import { text } from "./fields";

/**
 * The input schemas are built from the tables with drizzle-zod, so a column added to a table reaches
 * the forms and the API with no second list to keep. The table says which fields there are and which
 * may be empty (a nullable column: absent or null, so a PATCH can clear it); the schema modules say each
 * field's check: bounds, units and the words of the message.
 *
 * Only the table modules are imported (db/notebook-schema.ts, db/mentor-schema.ts), never db/client.ts:
 * they hold column definitions and drizzle-orm's column builders, nothing of the database driver, so
 * the web app can bundle them.
 */

/** Columns the server fills from the request and the row's history; no input names them. */
const SERVER_COLUMNS = [
  "id",
  "shopId",
  "createdBy",
  "createdAt",
  "updatedAt",
  "updatedBy",
  "version",
  "archivedAt",
  "archivedBy",
  "idempotencyKey",
] as const;
type ServerColumn = (typeof SERVER_COLUMNS)[number];

type Columns<T extends Table> = T["_"]["columns"];
/** A nullable column's field may be absent or null; a NOT NULL one must be given. */
type Field<C extends Column, S extends z.ZodType> = C["_"]["notNull"] extends true
  ? S
  : z.ZodOptional<z.ZodNullable<S>>;
type Base<T extends Table> = ReturnType<typeof createInsertSchema<T>>["shape"];
type Checked<T extends Table, C extends Checks<T>> = Omit<Base<T>, keyof C> & {
  [K in keyof C & keyof Columns<T>]: Field<Columns<T>[K], NonNullable<C[K]>>;
};
export type Checks<T extends Table> = { [K in keyof Columns<T>]?: z.ZodType };

/**
 * The fields a person sets on a row of `table`: every column but the server's and those in `omit` (set
 * from the URL, such as the melt a casting belongs to), each checked by `checks` where it names one.
 * A text column without a check still gets the edge check of lib/fields.ts (trimmed, no NUL, at most a
 * page), so a new column can never carry what PostgreSQL refuses.
 */
export function tableInput<T extends Table, C extends Checks<T>, O extends Exclude<keyof Columns<T>, keyof C>>(
  table: T,
  checks: C,
  omit: readonly O[] = [],
) {
  const columns = getTableColumns(table) as Record<string, Column>;
  const shape: Record<string, z.ZodType> = { ...createInsertSchema(table).shape };
  for (const [key, column] of Object.entries(columns)) {
    const given = (checks as Record<string, z.ZodType | undefined>)[key];
    const own = given ?? (column.columnType === "PgText" ? text() : undefined);
    if (own) shape[key] = column.notNull ? own : own.nullable().optional();
  }
  for (const key of [...SERVER_COLUMNS, ...(omit as readonly string[])]) delete shape[key];
  return z.object(shape) as unknown as z.ZodObject<Omit<Checked<T, C>, ServerColumn | O>>;
}
