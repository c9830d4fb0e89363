import { formatMoney, sumCents } from './money';

/**
 * The three-way match of purchasing practice: the purchase order (what was ordered, at what
 * price), the receipt (what arrived) and the invoice (what is billed), line by line. Every
 * difference larger than the organisation's tolerance is flagged in words; the invoice can be
 * approved for payment as it stands only when nothing is flagged (or with a written reason).
 */

export interface OrderLine {
  /** The price line's kind, e.g. "die" or "shipping". */
  kind: string;
  /** How the line reads to people, e.g. "Shipping" or "Die: 3 × 4 up carton". */
  label: string;
  amountCents: number;
}

export interface InvoicedLine {
  /** The purchase-order line this bills (its index in `ordered.lines`), or null for an extra line. */
  orderLine: number | null;
  label: string;
  amountCents: number;
  /** Why an extra line is billed (e.g. "Approved change: second perf"); extra lines need one. */
  reason?: string | null;
}

export interface MatchInput {
  currency: string;
  ordered: { dies: number; lines: readonly OrderLine[] };
  /** Null until the die is received. */
  received: { dies: number; condition: 'good' | 'damaged' } | null;
  /** The invoice with its credit notes: a credit is a negative amount on the line it corrects. */
  invoiced: { dies: number; lines: readonly InvoicedLine[] };
  /** The largest difference let through unflagged, per line and on the total, in minor units. */
  toleranceCents: number;
  /** For the words of the flags; en-US by default. */
  locale?: string;
}

export interface MatchedLine {
  label: string;
  orderedCents: number | null;
  invoicedCents: number;
  /** Invoiced less ordered. */
  differenceCents: number;
  flag: string | null;
  reason: string | null;
}

export interface InvoiceMatch {
  dies: { ordered: number; received: number; invoiced: number };
  lines: MatchedLine[];
  orderedCents: number;
  invoicedCents: number;
  differenceCents: number;
  /** Every flag in words, in the order of the lines, then quantities and the total. */
  flags: string[];
  matched: boolean;
}

const dies = (n: number) => `${n} ${n === 1 ? 'die' : 'dies'}`;

/** Compares purchase order, receipt and invoice; see the module comment. */
export function matchInvoice(input: MatchInput): InvoiceMatch {
  const { currency, ordered, received, invoiced, toleranceCents } = input;
  if (!Number.isSafeInteger(toleranceCents) || toleranceCents < 0)
    throw new RangeError(`The tolerance must be a whole, non-negative number of minor units, not ${toleranceCents}`);
  const money = (cents: number) => formatMoney({ cents: Math.abs(cents), currency }, input.locale);
  const over = (difference: number) => Math.abs(difference) > toleranceCents;
  const describe = (label: string, difference: number) =>
    `${label} invoiced ${money(difference)} ${difference > 0 ? 'over' : 'under'} the PO`;

  const lines: MatchedLine[] = ordered.lines.map((line, index) => {
    const billed = invoiced.lines.filter((l) => l.orderLine === index);
    const invoicedCents = sumCents(billed.map((l) => l.amountCents));
    const differenceCents = invoicedCents - line.amountCents;
    return {
      label: line.label,
      orderedCents: line.amountCents,
      invoicedCents,
      differenceCents,
      flag: over(differenceCents) ? describe(line.label, differenceCents) : null,
      reason: billed.map((l) => l.reason).find(Boolean) ?? null,
    };
  });
  for (const line of invoiced.lines) {
    if (line.orderLine !== null && line.orderLine >= 0 && line.orderLine < ordered.lines.length) continue;
    const flag = over(line.amountCents)
      ? `${line.label} invoiced ${money(line.amountCents)}${line.amountCents < 0 ? ' credit' : ''}, not on the PO` +
        (line.reason ? ` (${line.reason})` : '')
      : null;
    lines.push({
      label: line.label,
      orderedCents: null,
      invoicedCents: line.amountCents,
      differenceCents: line.amountCents,
      flag,
      reason: line.reason ?? null,
    });
  }

  const flags = lines.flatMap((l) => (l.flag ? [l.flag] : []));
  const receivedDies = received?.dies ?? 0;
  if (invoiced.dies !== ordered.dies) flags.push(`${dies(invoiced.dies)} invoiced, ${dies(ordered.dies)} ordered`);
  if (invoiced.dies > receivedDies)
    flags.push(
      receivedDies ? `${dies(invoiced.dies)} invoiced, ${dies(receivedDies)} received` : 'Nothing received yet',
    );
  if (received?.condition === 'damaged') flags.push('The die was received damaged');

  const orderedCents = sumCents(ordered.lines.map((l) => l.amountCents));
  const invoicedCents = sumCents(invoiced.lines.map((l) => l.amountCents));
  const differenceCents = invoicedCents - orderedCents;
  // Lines within the tolerance can still add up past it.
  if (over(differenceCents) && lines.every((l) => !l.flag))
    flags.push(`The total is invoiced ${money(differenceCents)} ${differenceCents > 0 ? 'over' : 'under'} the PO`);

  return {
    dies: { ordered: ordered.dies, received: receivedDies, invoiced: invoiced.dies },
    lines,
    orderedCents,
    invoicedCents,
    differenceCents,
    flags,
    matched: flags.length === 0,
  };
}

/**
 * Tax at the rate the shop enters, in basis points (825 = 8.25 %), on the amount in minor
 * units, rounded half away from zero to the minor unit. Kerfmark computes no tax beyond this:
 * which rate applies is for the shop and local tax rules.
 */
export function taxAtRate(amountCents: number, rateBasisPoints: number): number {
  if (!Number.isSafeInteger(amountCents)) throw new RangeError(`Not a whole number of minor units: ${amountCents}`);
  if (!Number.isInteger(rateBasisPoints) || rateBasisPoints < 0 || rateBasisPoints > 10_000)
    throw new RangeError(`A tax rate is 0 to 10,000 basis points, not ${rateBasisPoints}`);
  // In BigInt, so that the product of a large amount and the rate stays exact.
  const product = BigInt(Math.abs(amountCents)) * BigInt(rateBasisPoints);
  const rounded = Number((product + 5_000n) / 10_000n);
  return amountCents < 0 ? -rounded : rounded;
}
