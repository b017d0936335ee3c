import { Op } from 'sequelize';
import { User } from '../models';
import type { PersonRef } from '../../shared/schemas/refs';

export type { PersonRef };

/** Names of the given users in one query, for presenters. */
export async function peopleById(ids: (string | null | undefined)[]) {
  const wanted = [...new Set(ids.filter((id): id is string => !!id))];
  const users = wanted.length
    ? await User.findAll({ where: { id: { [Op.in]: wanted } }, attributes: ['id', 'name'] })
    : [];
  const map = new Map<string, PersonRef>(users.map((u) => [u.id, { id: u.id, name: u.name }]));
  return (id: string | null | undefined): PersonRef | null => (id ? (map.get(id) ?? null) : null);
}

export type PeopleLookup = Awaited<ReturnType<typeof peopleById>>;
