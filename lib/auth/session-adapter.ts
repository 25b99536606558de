import { NodePostgresAdapter } from "@lucia-auth/adapter-postgresql";
import type { DatabaseSession, DatabaseUser } from "lucia";
import type pg from "pg";
import type { Membership } from "@/db/crews";

// Every signed-in request begins with this read, so it is one prepared statement: the session, its person (never the
// password hash) and the person's crews with their roles, ordered by crew name as the crew switcher lists them.
const SESSION_AND_PERSON = {
  name: "spanwright-session-and-person",
  text: `SELECT s.user_id, s.expires_at, u.email, u.name,
            coalesce((SELECT json_agg(json_build_object('crew', json_build_object('id', c.id, 'name', c.name, 'units', c.units), 'role', m.role)
                                      ORDER BY c.name, c.id)
                        FROM crew_members m JOIN crews c ON c.id = m.crew_id
                       WHERE m.user_id = u.id), '[]') AS memberships
       FROM sessions s JOIN users u ON u.id = s.user_id
      WHERE s.id = $1`,
};

interface SessionRow {
  user_id: string;
  expires_at: Date;
  email: string;
  name: string;
  memberships: Membership[];
}

/** lucia's PostgreSQL adapter, reading a session with its person and their crews in one round trip instead of three. */
export class SessionAdapter extends NodePostgresAdapter {
  constructor(private readonly pool: pg.Pool) {
    super(pool, { user: "users", session: "sessions" });
  }

  override async getSessionAndUser(sessionId: string): Promise<[DatabaseSession | null, DatabaseUser | null]> {
    const { rows } = await this.pool.query<SessionRow>({ ...SESSION_AND_PERSON, values: [sessionId] });
    const row = rows[0];
    if (!row) return [null, null];
    return [
      { id: sessionId, userId: row.user_id, expiresAt: row.expires_at, attributes: {} },
      { id: row.user_id, attributes: { email: row.email, name: row.name, memberships: row.memberships } },
    ];
  }
}
