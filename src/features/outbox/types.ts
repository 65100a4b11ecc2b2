/** One message of the local fake mail transport (`GET /api/outbox`). */
export type OutboxMessage = {
  id: number;
  to: string;
  subject: string;
  text: string;
  html: string;
  links: string[];
  createdAt: string;
};
