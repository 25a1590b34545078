import crypto from 'node:crypto';
import type { Pool, QueryResultRow } from 'pg';

/*
 * Hot read paths run as named prepared statements on the pg pool: each connection plans a
 * statement once and then reuses it (PostgreSQL switches to a cached generic plan when that costs
 * no more than planning each time), where an unnamed or inline-literal query is parsed and planned
 * on every request. For these list queries planning took as long as running them.
 *
 * The SQL may use `:name` placeholders (as Sequelize replacements do); they become $1, $2, … in
 * order of first use. `::type` casts are left alone. The statement's name is a hash of its final
 * text, so each distinct shape of a query is prepared once per connection.
 */
const converted = new Map<string, { text: string; names: string[]; name: string }>();

function convert(sql: string) {
  let known = converted.get(sql);
  if (!known) {
    const names: string[] = [];
    const text = sql.replace(/(?<![:\w]):([A-Za-z_]\w*)/g, (_, name: string) => {
      let index = names.indexOf(name);
      if (index === -1) index = names.push(name) - 1;
      return `$${index + 1}`;
    });
    known = { text, names, name: `q${crypto.createHash('sha1').update(text).digest('hex').slice(0, 20)}` };
    converted.set(sql, known);
  }
  return known;
}

export async function preparedQuery<R extends QueryResultRow>(pool: Pool, sql: string, params: Record<string, unknown> = {}): Promise<R[]> {
  const { text, names, name } = convert(sql);
  const values = names.map((n) => {
    if (!(n in params)) throw new Error(`preparedQuery: no value for :${n}`);
    return params[n];
  });
  const { rows } = await pool.query<R>({ name, text, values });
  return rows;
}
