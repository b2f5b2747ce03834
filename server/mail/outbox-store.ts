import type pg from 'pg';
import type { StoredMail } from './fake-smtp';

/** Messages older than this leave the development outbox. */
const KEEP_DAYS = 14;

interface OutboxRow {
  id: string;
  sender: string;
  recipients: string[];
  subject: string;
  body_text: string;
  body_html: string | null;
  message_id: string | null;
  received_at: Date;
}

/**
 * The development outbox in PostgreSQL (table dev_outbox), so that every app process reads the
 * mail any of them sent: the fake SMTP server saves each message here before it says 250.
 */
export function createOutboxStore(pool: pg.Pool) {
  let saves = 0;
  return {
    async save(mail: StoredMail) {
      await pool.query(
        'INSERT INTO dev_outbox (id, sender, recipients, subject, body_text, body_html, message_id, received_at) VALUES ($1, $2, $3, $4, $5, $6, $7, $8)',
        [mail.id, mail.from, mail.to, mail.subject, mail.text, mail.html ?? null, mail.messageId ?? null, mail.receivedAt],
      );
      if (++saves % 100 === 1) await pool.query(`DELETE FROM dev_outbox WHERE received_at < now() - interval '${KEEP_DAYS} days'`);
    },
    /** newest first */
    async list(limit: number): Promise<StoredMail[]> {
      const { rows } = await pool.query<OutboxRow>('SELECT * FROM dev_outbox ORDER BY received_at DESC, id LIMIT $1', [limit]);
      return rows.map((row) => {
        const mail: StoredMail = {
          id: row.id,
          from: row.sender,
          to: row.recipients,
          subject: row.subject,
          text: row.body_text,
          receivedAt: row.received_at.toISOString(),
        };
        if (row.body_html !== null) mail.html = row.body_html;
        if (row.message_id !== null) mail.messageId = row.message_id;
        return mail;
      });
    },
  };
}

export type OutboxStore = ReturnType<typeof createOutboxStore>;
