import { QueryTypes, type Model, type ModelStatic } from 'sequelize';
import { sequelize } from '../db';

const selectLists = new Map<string, string>();
const quote = (name: string) => sequelize.getQueryInterface().quoteIdentifier(name);

/**
 * Every attribute of a model as a select list under an alias (`t.created_at AS "createdAt", …`),
 * worked out once per model and alias from the model's own definition.
 */
export function columnsOf(model: ModelStatic<Model>, alias: string): string {
  const key = `${model.name} ${alias}`;
  let list = selectLists.get(key);
  if (!list) {
    list = Object.entries(model.getAttributes())
      .map(([name, a]) => `${alias}.${quote(a.field ?? name)} AS ${quote(name)}`)
      .join(', ');
    selectLists.set(key, list);
  }
  return list;
}

/**
 * Runs a plain SELECT with bound parameters (`$name` in the SQL) and hands back its rows. For the
 * reads every signed-in request makes: Sequelize's finders rebuild the SQL and group joined rows
 * on each call, which cost more than the query itself (issue 16's profile). The values come
 * through Sequelize's own connections, so its type parsers (dates, date-only strings) apply as
 * they do for the finders.
 */
export function selectRows<R extends object>(sql: string, bind: Record<string, unknown>): Promise<R[]> {
  return sequelize.query<R>(sql, { bind, type: QueryTypes.SELECT });
}

/** A stored instance of a model from a row read by `selectRows` (no setters run, saves as an update). */
export function stored<M extends Model>(model: ModelStatic<M>, row: object): M {
  return model.build(row as M['_creationAttributes'], { isNewRecord: false, raw: true });
}

/** A record by id through a plain select (`findByPk` for the hot reads), or null. */
export async function findStored<M extends Model>(model: ModelStatic<M>, id: string): Promise<M | null> {
  const [row] = await selectRows(`SELECT ${columnsOf(model, 'r')} FROM ${quote(String(model.getTableName()))} r WHERE r.id = $id`, { id });
  return row ? stored(model, row) : null;
}

const jsonObjects = new Map<string, string>();

/**
 * Every attribute of a model as one JSON object under an alias (`json_build_object('id', s.id, …)`),
 * keyed by attribute name: for a joined record gathered into a row with `json_agg`.
 */
export function jsonOf(model: ModelStatic<Model>, alias: string): string {
  const key = `${model.name} ${alias}`;
  let sql = jsonObjects.get(key);
  if (!sql) {
    const pairs = Object.entries(model.getAttributes()).map(([name, a]) => `'${name}', ${alias}.${quote(a.field ?? name)}`);
    sql = `json_build_object(${pairs.join(', ')})`;
    jsonObjects.set(key, sql);
  }
  return sql;
}

/**
 * A stored instance from an object built by `jsonOf`. JSON has no dates: a DATE attribute comes
 * as PostgreSQL's ISO text with its offset and becomes a Date again (DATEONLY stays text, as
 * Sequelize gives it). Other types arrive as JSON gives them: use it for text, uuid, integer,
 * boolean, enum and json columns.
 */
export function storedFromJson<M extends Model>(model: ModelStatic<M>, json: Record<string, unknown>): M {
  const row: Record<string, unknown> = { ...json };
  for (const [name, a] of Object.entries(model.getAttributes())) {
    const v = row[name];
    if (typeof v === 'string' && (a.type as { key?: string }).key === 'DATE') row[name] = new Date(v);
  }
  return stored(model, row);
}
