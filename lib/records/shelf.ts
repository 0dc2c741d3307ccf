import type { Knex } from "knex";

/** Which records a list shows (issue 16): the active ones, or only those archived. */
export type Shelf = "active" | "archived";

/** A `.where(...)` group that keeps the records of one shelf by their archived_at column (keeps Knex's row types, unlike `modify`). */
export function onShelf(shelf: Shelf, column = "archived_at") {
  return (q: Knex.QueryBuilder) => {
    if (shelf === "archived") q.whereNotNull(column);
    else q.whereNull(column);
  };
}
