import { count, desc, eq, ilike } from 'drizzle-orm';
import type { MailMessage, MailPage } from '../../shared/api/auth';
import { problemTypes } from '../../shared/api/problem';
import type { Database } from '../db/database';
import { mailMessages } from '../db/schema/mail';
import { HttpProblem } from '../middleware/http-problem';

/** The development outbox: what the local SMTP server received. */
export class DevMailService {
  constructor(private readonly db: Database) {}

  async list(query: { to?: string | undefined; page: number; pageSize: number }): Promise<MailPage> {
    const where = query.to ? ilike(mailMessages.to, `%${query.to.replace(/[\\%_]/g, (c) => `\\${c}`)}%`) : undefined;
    const [rows, [total]] = await Promise.all([
      this.db
        .select({ id: mailMessages.id, to: mailMessages.to, from: mailMessages.from, subject: mailMessages.subject, receivedAt: mailMessages.receivedAt })
        .from(mailMessages)
        .where(where)
        .orderBy(desc(mailMessages.receivedAt), desc(mailMessages.id))
        .limit(query.pageSize)
        .offset((query.page - 1) * query.pageSize),
      this.db.select({ n: count() }).from(mailMessages).where(where),
    ]);
    return { items: rows.map((row) => ({ ...row, receivedAt: row.receivedAt.toISOString() })), total: total?.n ?? 0, page: query.page, pageSize: query.pageSize };
  }

  async get(id: number): Promise<MailMessage> {
    const [row] = await this.db.select().from(mailMessages).where(eq(mailMessages.id, id));
    if (!row) throw new HttpProblem({ type: problemTypes.notFound, title: 'Not found', status: 404, detail: `There is no message ${id} in the outbox.` });
    return { id: row.id, to: row.to, from: row.from, subject: row.subject, receivedAt: row.receivedAt.toISOString(), html: row.html, text: row.text };
  }
}
