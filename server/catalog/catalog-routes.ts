/**
 * The routes every catalog has, built once: list (filter, sort, pages), get
 * (with its ETag), create, update and state change (both If-Match), delete.
 * Operation ids follow one pattern, e.g. listMaterials, getMaterial,
 * createMaterial, updateMaterial, changeMaterialState, deleteMaterial.
 */
import { Router, type Request } from 'express';
import type { ApiContract } from '../api-contract';
import { Problem } from '../errors';
import { actorOf, requireRole } from '../auth/principal';
import type { CatalogRecord, ListQuery } from './catalog-repository';
import { etagOf, type Catalog } from './catalog-service';
import type { CatalogState } from './catalog-states';

export interface CatalogNames {
  /** URL segment, e.g. 'materials'. */
  path: string;
  /** Operation-id stems, e.g. 'Material' and 'Materials'. */
  singular: string;
  plural: string;
}

const DEFAULT_PAGE_SIZE = 50;
const COMMON_QUERY = new Set(['page', 'pageSize', 'sort', 'q', 'state']);

/** The list query after the contract has checked it; feature filters are the remaining parameters. */
export function listQueryOf(req: Request): ListQuery {
  const query = req.query as Record<string, string | undefined>;
  const filters = Object.fromEntries(Object.entries(query).filter(([name, value]) => !COMMON_QUERY.has(name) && typeof value === 'string')) as Record<string, string>;
  return {
    page: Number(query['page'] ?? 1),
    pageSize: Number(query['pageSize'] ?? DEFAULT_PAGE_SIZE),
    sort: query['sort'],
    q: query['q'],
    state: query['state'] as CatalogState | undefined,
    filters,
  };
}

/** The version a write starts from, from `If-Match: "3"`; 428 when the header is missing. */
export function versionOf(req: Request): number {
  const header = req.get('if-match');
  if (!header) throw new Problem(428, 'Precondition required', 'Send If-Match with the ETag of the version you read, so no one else\'s change is lost.');
  const match = /^(?:W\/)?"(\d+)"$/.exec(header.trim());
  if (!match) throw Problem.badRequest('If-Match must be an ETag from this API, e.g. "3".', [{ field: 'If-Match', detail: 'must look like "3"' }]);
  return Number(match[1]);
}

export function catalogRoutes<R extends CatalogRecord>(contract: ApiContract, catalog: Catalog<R, unknown, unknown>, names: CatalogNames): Router {
  const { path, singular, plural } = names;
  const reader = requireRole('viewer');
  const writer = requireRole('engineer');
  return Router()
    .get(`/${path}`, reader, contract.validate(`list${plural}`), async (req, res) => {
      res.json(await catalog.list(listQueryOf(req)));
    })
    .post(`/${path}`, writer, contract.validate(`create${singular}`), async (req, res) => {
      const created = await catalog.create(actorOf(req.principal), req.body);
      res.status(201).location(`${req.baseUrl}/${path}/${created.id}`).set('ETag', etagOf(created.version)).json(await catalog.present(created));
    })
    .get(`/${path}/:id`, reader, contract.validate(`get${singular}`), async (req, res) => {
      const record = await catalog.get(Number(req.params['id']));
      res.set('ETag', etagOf(record.version)).json(await catalog.present(record));
    })
    .patch(`/${path}/:id`, writer, contract.validate(`update${singular}`), async (req, res) => {
      const updated = await catalog.update(actorOf(req.principal), Number(req.params['id']), versionOf(req), req.body);
      res.set('ETag', etagOf(updated.version)).json(await catalog.present(updated));
    })
    .post(`/${path}/:id/state`, writer, contract.validate(`change${singular}State`), async (req, res) => {
      const moved = await catalog.transition(actorOf(req.principal), Number(req.params['id']), versionOf(req), req.body.state);
      res.set('ETag', etagOf(moved.version)).json(await catalog.present(moved));
    })
    .delete(`/${path}/:id`, writer, contract.validate(`delete${singular}`), async (req, res) => {
      await catalog.remove(actorOf(req.principal), Number(req.params['id']), versionOf(req));
      res.status(204).end();
    });
}
