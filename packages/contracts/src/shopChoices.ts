import { z } from 'zod';
import type { DieFit, DieNeeds, ShopCapabilities } from './dieFit';
import { recordId } from './ids';

const flag = z
  .enum(['true', 'false'])
  .transform((v) => v === 'true')
  .default(false);

/** What the buyer has said so far of the die, for the list of shops to invite. */
export const DieShopsQuery = z.object({
  pressId: recordId(z.coerce.number(), 'Choose one of your presses').optional(),
  /** A saved request: its measured die board counts in the fit. */
  requestId: recordId(z.coerce.number(), 'Choose one of your requests').optional(),
  counterWanted: flag,
  ejectionRubberWanted: flag,
  deliveryPostcode: z.string().trim().max(12, 'At most 12 characters').optional(),
});
export type DieShopsQuery = z.input<typeof DieShopsQuery>;

/** A die shop a printer may invite: what it can do, how far it is and how it has done. */
export interface DieShopChoice {
  id: number;
  name: string;
  postcode: string | null;
  /** Miles from the delivery postcode; null when either postcode is unknown. */
  miles: number | null;
  capabilities: ShopCapabilities & { laserCutBoards: boolean | null };
  /** Dies shipped by the promised date ÷ dies shipped, over every printer; null before the first. */
  onTimeRate: number | null;
  shipped: number;
  /** Dies this printer has awarded the shop. */
  jobsWithUs: number;
  fit: DieFit;
}

/** The shops to invite, and what of the die they were checked against. */
export interface DieShopChoices {
  needs: DieNeeds;
  shops: DieShopChoice[];
}
