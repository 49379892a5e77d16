import { Op, Sequelize, type Order, type WhereOptions } from 'sequelize';
import { Source, User } from '../models';
import { unauthenticated } from '../errors';
import type { Actor } from '../policies';
import { sourcePolicy } from '../policies/source';
import type { ListSourcesQuery } from '@shared/catalogue/requests';
import { sourceViewsFor, type SourceView } from './catalogue-read';

const published = { [Op.or]: [{ status: 'approved' }, { approvedVersion: { [Op.ne]: null } }] };
const escapeLike = (value: string) => `%${value.replace(/[\\%_]/g, (c) => `\\${c}`)}%`;

/** Who sees which rows: readers the published ones, contributors also their own, editors all. */
function visibility(actor: Actor): WhereOptions<Source> {
  if (sourcePolicy.seesAll(actor)) return {};
  if (actor && sourcePolicy.create(actor)) return { [Op.or]: [published, { contributorId: actor.id }] };
  return published;
}

const sortColumns = { title: ['title'], date: ['dateEarliest', 'dateLatest'], createdAt: ['createdAt'], updatedAt: ['updatedAt'] } as const;

/** One page of sources as this person may see them, filtered and sorted in the database. */
export async function listSources(actor: Actor, query: ListSourcesQuery): Promise<{ views: SourceView[]; total: number }> {
  const and: WhereOptions<Source>[] = [visibility(actor)];
  if (query.mine) {
    if (!actor) throw unauthenticated('Sign in to list your own sources.');
    and.push({ contributorId: actor.id });
  }
  if (query.type) and.push({ sourceType: query.type });
  if (query.status) and.push({ status: query.status });
  // Overlap: the source's span touches [from, to].
  if (query.from !== undefined) and.push({ dateLatest: { [Op.gte]: `${String(query.from).padStart(4, '0')}-01-01` } });
  if (query.to !== undefined) and.push({ dateEarliest: { [Op.lte]: `${String(query.to).padStart(4, '0')}-12-31` } });
  if (query.lang) {
    and.push(Sequelize.where(Sequelize.fn('JSON_CONTAINS', Sequelize.col('languages'), JSON.stringify(query.lang)), 1) as WhereOptions<Source>);
  }
  if (query.q) and.push({ [Op.or]: [{ title: { [Op.like]: escapeLike(query.q) } }, { shelfmark: { [Op.like]: escapeLike(query.q) } }] });

  const key = query.sort.replace(/^-/, '') as keyof typeof sortColumns;
  const direction = (query.order ?? (query.sort.startsWith('-') ? 'desc' : 'asc')).toUpperCase();
  const order: Order = [...sortColumns[key].map((column) => [column, direction] as [string, string]), ['id', direction]];

  const { rows, count } = await Source.findAndCountAll({
    where: { [Op.and]: and },
    include: [{ model: User, as: 'contributor', attributes: ['id', 'displayName'] }],
    order,
    limit: query.perPage,
    offset: (query.page - 1) * query.perPage,
    distinct: true,
  });
  return { views: await sourceViewsFor(actor, rows), total: count };
}
