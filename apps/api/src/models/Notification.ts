import { Model } from 'objection';

export class Notification extends Model {
  static override tableName = 'notifications';

  id!: number;
  userId!: number;
  kind!: string;
  title!: string;
  body!: string;
  link!: string | null;
  readAt!: Date | null;
  createdAt!: Date;
}
