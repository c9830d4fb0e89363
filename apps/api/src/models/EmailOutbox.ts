import { Model } from 'objection';

export class EmailOutbox extends Model {
  static override tableName = 'email_outbox';

  id!: number;
  toAddress!: string;
  subject!: string;
  textBody!: string;
  htmlBody!: string | null;
  kind!: string;
  status!: 'pending' | 'sent' | 'failed';
  attempts!: number;
  lastError!: string | null;
  nextAttemptAt!: Date;
  sentAt!: Date | null;
  createdAt!: Date;
}
