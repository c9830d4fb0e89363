import { Model } from 'objection';

export class RequestQuestion extends Model {
  static override tableName = 'request_questions';

  id!: number;
  requestId!: number;
  shopId!: number;
  askedBy!: number | null;
  question!: string;
  askedAt!: Date;
  answer!: string | null;
  answeredBy!: number | null;
  answeredAt!: Date | null;
}
