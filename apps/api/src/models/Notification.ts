import type { NotificationKind } from '@kerfmark/contracts';
import { Model } from 'objection';

export class Notification extends Model {
  static override tableName = 'notifications';

  id!: number;
  userId!: number;
  kind!: NotificationKind;
  title!: string;
  body!: string;
  link!: string | null;
  readAt!: Date | null;
  createdAt!: Date;
}
