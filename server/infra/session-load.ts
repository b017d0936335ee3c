// The live session of a request with its user and memberships, read in one plain statement on
// every request. Sequelize's nested include did the same in one query but cost about 4 ms of CPU
// per request to build and parse (issue 12: the fixed cost that dominated small farms); here the
// database nests the rows as JSON and the model instances are built straight from the columns.
import { QueryTypes, type Model, type ModelStatic } from 'sequelize';
import { sequelize } from '../db';
import { Membership, Organization, User } from '../models';

/** How to turn one model's JSON row (column names, timestamps as text) into its attributes. */
function columnsOf(model: ModelStatic<Model>) {
  return Object.entries(model.getAttributes()).map(([name, attribute]) => ({
    name,
    field: attribute.field ?? name,
    // timestamps come back from to_jsonb as ISO text; DATEONLY stays a yyyy-mm-dd string
    isTimestamp: (attribute.type as { key?: string }).key === 'DATE',
  }));
}
const COLUMNS = new Map<ModelStatic<Model>, ReturnType<typeof columnsOf>>();

/** A persisted instance of `model` from a to_jsonb() row, as a findOne would have built it. */
export function instanceFrom<M extends Model>(
  model: ModelStatic<M>,
  row: Record<string, unknown>,
): M {
  let columns = COLUMNS.get(model);
  if (!columns) COLUMNS.set(model, (columns = columnsOf(model)));
  const values: Record<string, unknown> = {};
  for (const c of columns) {
    const v = row[c.field];
    values[c.name] = c.isTimestamp && typeof v === 'string' ? new Date(v) : v;
  }
  return model.build(values as M['_creationAttributes'], { raw: true, isNewRecord: false });
}

const SESSION_SQL = `SELECT s.last_seen_at, to_jsonb(u) AS "user",
    coalesce((SELECT jsonb_agg(jsonb_build_object('m', to_jsonb(m), 'o', to_jsonb(o)) ORDER BY m.created_at, m.id)
      FROM memberships m JOIN organizations o ON o.id = m.organization_id
      WHERE m.user_id = u.id), '[]'::jsonb) AS memberships
  FROM sessions s JOIN users u ON u.id = s.user_id
  WHERE s.id = :sessionId AND s.user_id = :userId AND s.revoked_at IS NULL AND s.expires_at > now()`;

interface SessionRow {
  last_seen_at: Date;
  user: Record<string, unknown>;
  memberships: { m: Record<string, unknown>; o: Record<string, unknown> }[];
}

export type SessionUser = User & { memberships: Membership[] };

/** The user (with memberships and their organizations) of a live session, or null. */
export async function readLiveSession(
  userId: string,
  sessionId: string,
): Promise<{ lastSeenAt: Date; user: SessionUser } | null> {
  const [row] = await sequelize.query<SessionRow>(SESSION_SQL, {
    replacements: { userId, sessionId },
    type: QueryTypes.SELECT,
  });
  if (!row) return null;
  const user = instanceFrom(User, row.user) as SessionUser;
  user.memberships = row.memberships.map(({ m, o }) => {
    const membership = instanceFrom(Membership, m);
    membership.organization = instanceFrom(Organization, o);
    return membership;
  });
  return { lastSeenAt: new Date(row.last_seen_at), user };
}
