import type { EntityManager, EntityTarget, ObjectLiteral } from 'typeorm';

/**
 * Rows that are not (yet) in the database, per entity, added to what `find` returns.
 *
 * The review desk shows what approving a report would do to the likelihoods: it asks the same
 * LikelihoodService that ranks causes everywhere, through a manager that also "sees" the
 * outcome or the possible cause the report would write. Nothing is written, so nothing has to
 * be rolled back (on the single SQLite connection a rolled-back probe could take other
 * requests' writes with it). Only `find` with plain equality `where` and `order` is overlaid;
 * any other query shape is refused loudly rather than silently ignoring the extra rows.
 */
export function overlayManager(em: EntityManager, extra: Map<EntityTarget<ObjectLiteral>, ObjectLiteral[]>): EntityManager {
  return new Proxy(em, {
    get(target, prop, receiver) {
      if (prop !== 'getRepository') return Reflect.get(target, prop, receiver);
      return (entity: EntityTarget<ObjectLiteral>) => {
        const repo = target.getRepository(entity);
        const rows = extra.get(entity);
        if (!rows?.length) return repo;
        return new Proxy(repo, {
          get(r, p, recv) {
            if (p === 'find') {
              return async (options?: { where?: Record<string, unknown>; order?: Record<string, 'ASC' | 'DESC'> }) => {
                const real = await r.find(options as never);
                const added = rows.filter((row) => matches(row, options?.where));
                return sortRows([...real, ...added], options?.order);
              };
            }
            if (typeof p === 'string' && ['findOne', 'findBy', 'findOneBy', 'count', 'createQueryBuilder', 'findAndCount'].includes(p)) {
              throw new Error(`overlayManager: ${p} is not overlaid; the review diff needs updating`);
            }
            return Reflect.get(r, p, recv);
          },
        });
      };
    },
  });
}

function matches(row: ObjectLiteral, where: Record<string, unknown> | undefined): boolean {
  if (!where) return true;
  return Object.entries(where).every(([k, v]) => {
    if (v !== null && typeof v === 'object') throw new Error(`overlayManager: where.${k} is not a plain value`);
    return row[k] === v;
  });
}

function sortRows(rows: ObjectLiteral[], order: Record<string, 'ASC' | 'DESC'> | undefined): ObjectLiteral[] {
  if (!order) return rows;
  const keys = Object.entries(order);
  return [...rows].sort((a, b) => {
    for (const [k, dir] of keys) {
      const x = a[k] as string | number;
      const y = b[k] as string | number;
      if (x === y) continue;
      const c = x < y ? -1 : 1;
      return String(dir).toUpperCase() === 'DESC' ? -c : c;
    }
    return 0;
  });
}
