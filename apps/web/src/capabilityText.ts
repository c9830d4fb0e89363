import { dieKindLabels, type ShopCapabilities } from '@kerfmark/contracts';
import { bothLengths, otherSize, size } from './format';

const yesNo = (value: boolean | null) => (value === null ? 'Not stated' : value ? 'Yes' : 'No');

/** A die shop's capabilities as label and value, in the words of its profile page. */
export function capabilityText(c: ShopCapabilities & { laserCutBoards: boolean | null }): Array<[string, string]> {
  return [
    ['Die kinds', c.dieKinds.map((k) => dieKindLabels[k]).join(', ') || 'Not stated'],
    [
      'Largest die board',
      c.maxBoardWidthIn && c.maxBoardLengthIn
        ? `${size(c.maxBoardWidthIn, c.maxBoardLengthIn)} (${otherSize(c.maxBoardWidthIn, c.maxBoardLengthIn, 1)})`
        : 'Not stated',
    ],
    ['Cutting rule heights', c.ruleHeightsIn.map((h) => bothLengths(h, 3)).join(', ') || 'Not stated'],
    ['Makes counters', yesNo(c.makesCounters)],
    ['Fits ejection rubber', yesNo(c.fitsEjectionRubber)],
    ['Cuts die boards by laser', yesNo(c.laserCutBoards)],
  ];
}
