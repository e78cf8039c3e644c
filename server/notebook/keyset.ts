import { sql, type SQL } from "drizzle-orm";
import { HttpError } from "../http/errors";

/**
 * Keyset paging for the notebook's lists. An order is a list of keys, each an SQL expression with its
 * direction and the kind of value it holds; the last key is the row's id, so every row has one place.
 * A page is the rows after the previous page's last one in that order, read straight from the index
 * that has the same keys, so page 5,000 costs what page 1 does and a row added meanwhile is neither
 * skipped nor shown twice. The cursor (`next`, sent back as `after`) is opaque to the app: base64url
 * of the list and sort's name and the last row's keys, checked key by key before it reaches SQL.
 */
export type KeyKind = "day" | "id" | "count" | "text";
export type OrderKey = {
  expr: SQL;
  dir: "asc" | "desc";
  kind: KeyKind;
  /** The index was made DESC NULLS LAST (drizzle's way): the ORDER BY must say so to be read from it. */
  nullsLast?: boolean;
};
export type KeyValue = string | number;

const bad = (why = "after is the next value of a previous answer") =>
  new HttpError(400, "Some values need fixing.", { after: why });

export function encodeCursor(order: string, keys: KeyValue[]): string {
  return Buffer.from(JSON.stringify([order, ...keys])).toString("base64url");
}

const DAY = /^\d{4}-\d{2}-\d{2}$/;
const fits: Record<KeyKind, (v: unknown) => boolean> = {
  day: (v) => typeof v === "string" && DAY.test(v) && !Number.isNaN(Date.parse(`${v}T00:00:00Z`)),
  id: (v) => Number.isInteger(v) && (v as number) >= 1 && (v as number) <= 2_147_483_647,
  count: (v) => Number.isInteger(v) && (v as number) >= 0 && (v as number) <= 2_147_483_647,
  text: (v) => typeof v === "string" && v.length <= 200 && !v.includes("\0"),
};

/** The keys of a cursor made by `encodeCursor` for this list and sort ("melts:alloy"), or a 400 saying what is wrong. */
export function decodeCursor(after: string, order: string, kinds: KeyKind[]): KeyValue[] {
  let parsed: unknown;
  try {
    parsed = JSON.parse(Buffer.from(after, "base64url").toString("utf8"));
  } catch {
    throw bad();
  }
  if (!Array.isArray(parsed) || typeof parsed[0] !== "string") throw bad();
  if (parsed[0] !== order) throw bad("this cursor belongs to another list or sort order");
  const keys = parsed.slice(1) as unknown[];
  if (keys.length !== kinds.length || !keys.every((v, i) => fits[kinds[i]](v))) throw bad();
  return keys as KeyValue[];
}

const typed = (v: KeyValue, kind: KeyKind): SQL =>
  kind === "day" ? sql`${v}::date` : kind === "text" ? sql`${v}::text` : sql`${v}::int`;

/**
 * Rows after `values` in `order`. One direction throughout is one row comparison, which the index
 * answers as a range; mixed directions add the first key's bound (a range) to the exact condition.
 */
export function afterKeys(order: OrderKey[], values: KeyValue[]): SQL {
  const v = values.map((x, i) => typed(x, order[i].kind));
  if (order.every((k) => k.dir === order[0].dir)) {
    const op = order[0].dir === "asc" ? sql`>` : sql`<`;
    return sql`(${sql.join(
      order.map((k) => k.expr),
      sql`, `,
    )}) ${op} (${sql.join(v, sql`, `)})`;
  }
  const beyond = (i: number): SQL => {
    const strict = order[i].dir === "asc" ? sql`${order[i].expr} > ${v[i]}` : sql`${order[i].expr} < ${v[i]}`;
    return i === order.length - 1 ? strict : sql`(${strict} OR (${order[i].expr} = ${v[i]} AND ${beyond(i + 1)}))`;
  };
  const first = order[0].dir === "asc" ? sql`${order[0].expr} >= ${v[0]}` : sql`${order[0].expr} <= ${v[0]}`;
  return sql`(${first} AND ${beyond(0)})`;
}

export function orderBy(order: OrderKey[]): SQL {
  return sql.join(
    order.map((k) => sql`${k.expr} ${sql.raw(k.dir)}${sql.raw(k.nullsLast ? " nulls last" : "")}`),
    sql`, `,
  );
}

/**
 * The page out of `pageSize + 1` rows read: the extra row only says whether there is a next page,
 * so no list counts the shop.
 */
export function pageOf<R>(rows: R[], pageSize: number, order: string, keysOf: (r: R) => KeyValue[]) {
  const items = rows.slice(0, pageSize);
  const last = items[items.length - 1];
  return { items, next: rows.length > pageSize && last ? encodeCursor(order, keysOf(last)) : null };
}
