/** One message as the development outbox keeps it (GET /api/dev/outbox answers `{ messages }`). */
export interface OutboxMessage {
  id: string;
  /** the From header as written (display name and address), or the envelope sender */
  from: string;
  /** envelope recipients, so Cc and Bcc show too */
  to: string[];
  subject: string;
  text: string;
  html?: string;
  /** the Message-ID header, to match a mail with what the sender got back */
  messageId?: string;
  /** ISO 8601 */
  receivedAt: string;
}

export interface OutboxResponse {
  messages: OutboxMessage[];
}
