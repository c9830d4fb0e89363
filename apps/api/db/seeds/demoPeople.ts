import type { OrganisationProfileUpdate, OrgKind, Press, PressKind, Role } from '@kerfmark/contracts';

// The demo scenario's organisations, people and presses: invented, for the demo only. Street
// names are made up; the postcodes are real areas, so that distances work out.

export const DEMO_PASSWORD = 'kerfmark-demo-2026';

interface DemoOrg {
  name: string;
  kind: OrgKind;
  timeZone: string;
  postcode: string;
  /** ISO 3166 country; outside the US an organisation reads millimetres and en-GB by default. */
  country?: string;
  lengthUnits?: 'in' | 'mm';
  locale?: 'en-US' | 'en-GB';
  /** The profile: legal name and office, and a printer's terms or a die shop's capabilities. */
  profile: OrganisationProfileUpdate;
  users: Array<{ email: string; name: string; role: Role }>;
  presses?: Array<{
    name: string;
    kind: PressKind;
    maxSheetWidthIn: number;
    maxSheetLengthIn: number;
    typicalSpeedSph: number;
    maxSpeedSph: number;
    shiftsPerDay?: number;
    cuttingRuleHeightIn?: Press['cuttingRuleHeightIn'];
  }>;
}

// Press sizes and speeds follow common practice: a small platen takes about 22 × 30 in,
// die-cutters run about 2,000 to 5,000 sheets an hour, up to about 7,800 on a fast one.
export const demoOrganisations: DemoOrg[] = [
  {
    name: 'Larkspur Press & Carton',
    kind: 'printer',
    timeZone: 'America/Chicago',
    postcode: '60614',
    profile: {
      legalName: 'Larkspur Press & Carton Co.',
      officeAddress: '2150 Thistlecombe Row\nChicago, Illinois',
      contactEmail: 'purchasing@larkspur.example',
      paymentTerms: 'Net 30',
      deliveryPoints: [
        { name: 'Main plant, dock 2', address: '2150 Thistlecombe Row\nChicago, Illinois', postcode: '60614' },
        { name: 'Finishing annex', address: '41 Brackenhollow Court\nChicago, Illinois', postcode: '60614' },
      ],
    },
    users: [
      { email: 'maya@larkspur.example', name: 'Maya Lindqvist', role: 'buyer' },
      { email: 'daniel@larkspur.example', name: 'Daniel Osei', role: 'purchasing' },
      { email: 'priya@larkspur.example', name: 'Priya Raman', role: 'admin' },
    ],
    presses: [
      {
        name: 'Platen 1 (22 × 30)',
        kind: 'platen',
        maxSheetWidthIn: 22,
        maxSheetLengthIn: 30,
        typicalSpeedSph: 4000,
        maxSpeedSph: 5500,
      },
      {
        name: 'Flatbed A (28 × 40)',
        kind: 'flatbed',
        maxSheetWidthIn: 28,
        maxSheetLengthIn: 40,
        typicalSpeedSph: 5000,
        maxSpeedSph: 7800,
        shiftsPerDay: 2,
      },
      {
        name: 'Old platen (20 × 28)',
        kind: 'platen',
        maxSheetWidthIn: 20,
        maxSheetLengthIn: 28,
        typicalSpeedSph: 2000,
        maxSpeedSph: 2800,
        // An older press whose dies are made to the lower cutting rule height.
        cuttingRuleHeightIn: 0.918,
      },
    ],
  },
  {
    name: 'Tidewater Print Finishing',
    kind: 'printer',
    timeZone: 'America/New_York',
    postcode: '23510',
    profile: {
      legalName: 'Tidewater Print Finishing, Inc.',
      officeAddress: '600 Sallowmere Quay\nNorfolk, Virginia',
      contactEmail: 'accounts@tidewater.example',
      paymentTerms: 'Net 45 from receipt of the die',
      deliveryPoints: [
        { name: 'Receiving, door 4', address: '600 Sallowmere Quay\nNorfolk, Virginia', postcode: '23510' },
      ],
    },
    users: [
      { email: 'tomas@tidewater.example', name: 'Tomás Herrera', role: 'buyer' },
      { email: 'june@tidewater.example', name: 'June Park', role: 'purchasing' },
      { email: 'ruth@tidewater.example', name: 'Ruth Adeyemi', role: 'admin' },
    ],
    presses: [
      {
        name: 'Flatbed 1 (23 × 29)',
        kind: 'flatbed',
        maxSheetWidthIn: 23,
        maxSheetLengthIn: 29,
        typicalSpeedSph: 4500,
        maxSpeedSph: 6000,
      },
    ],
  },
  {
    // A metric printer in Berlin: millimetres, British English dates, its own time zone.
    name: 'Elbstrom Kartonagen',
    kind: 'printer',
    timeZone: 'Europe/Berlin',
    postcode: '12099',
    country: 'DE',
    lengthUnits: 'mm',
    locale: 'en-GB',
    profile: {
      legalName: 'Elbstrom Kartonagen GmbH',
      officeAddress: 'Weidenkorbweg 14\n12099 Berlin\nGermany',
      contactEmail: 'einkauf@elbstrom.example',
      paymentTerms: 'Net 30',
      deliveryPoints: [
        { name: 'Werk 1, Tor 3', address: 'Weidenkorbweg 14\n12099 Berlin\nGermany', postcode: '12099' },
      ],
    },
    users: [
      { email: 'hanna@elbstrom.example', name: 'Hanna Vogt', role: 'buyer' },
      { email: 'felix@elbstrom.example', name: 'Felix Brandt', role: 'purchasing' },
      { email: 'ines@elbstrom.example', name: 'Ines Kaya', role: 'admin' },
    ],
    // Metric sheet sizes, stored in inches to the thousandth: 740 × 1040 mm and 530 × 750 mm.
    presses: [
      {
        name: 'Flachbett 1 (740 × 1040 mm)',
        kind: 'flatbed',
        maxSheetWidthIn: 29.134,
        maxSheetLengthIn: 40.945,
        typicalSpeedSph: 5000,
        maxSpeedSph: 7500,
      },
      {
        name: 'Tiegel 2 (530 × 750 mm)',
        kind: 'platen',
        maxSheetWidthIn: 20.866,
        maxSheetLengthIn: 29.528,
        typicalSpeedSph: 3500,
        maxSpeedSph: 5000,
      },
    ],
  },
  {
    name: 'Brightline Rule & Die',
    kind: 'die_shop',
    timeZone: 'America/Chicago',
    postcode: '60148',
    // Flat dies of every usual size, both rule heights, laser-cut boards.
    profile: {
      legalName: 'Brightline Rule & Die LLC',
      officeAddress: '310 Fennick Industrial Parkway\nLombard, Illinois',
      contactEmail: 'quotes@brightline.example',
      dieKinds: ['flat'],
      maxBoardWidthIn: 40,
      maxBoardLengthIn: 60,
      ruleHeightsIn: [0.937, 0.918],
      makesCounters: true,
      fitsEjectionRubber: true,
      laserCutBoards: true,
    },
    users: [
      { email: 'grace@brightline.example', name: 'Grace Whitfield', role: 'estimator' },
      { email: 'ken@brightline.example', name: 'Ken Abiodun', role: 'admin' },
    ],
  },
  {
    name: 'Okafor Steel Rule Dies',
    kind: 'die_shop',
    timeZone: 'America/Indiana/Indianapolis',
    postcode: '46204',
    // The one shop that also makes rotary dies, on the largest boards.
    profile: {
      legalName: 'Okafor Steel Rule Dies, Inc.',
      officeAddress: '77 Marrowstone Avenue\nIndianapolis, Indiana',
      contactEmail: 'estimating@okafor.example',
      dieKinds: ['flat', 'rotary'],
      maxBoardWidthIn: 48,
      maxBoardLengthIn: 72,
      ruleHeightsIn: [0.937],
      makesCounters: true,
      fitsEjectionRubber: true,
      laserCutBoards: true,
    },
    users: [
      { email: 'chidi@okafor.example', name: 'Chidi Okafor', role: 'estimator' },
      { email: 'ada@okafor.example', name: 'Ada Okafor', role: 'admin' },
    ],
  },
  {
    name: 'Cedar Bend Die Works',
    kind: 'die_shop',
    timeZone: 'America/Chicago',
    postcode: '53202',
    // A small shop: flat dies on smaller boards, sawn by hand, no counters.
    profile: {
      legalName: 'Cedar Bend Die Works Ltd.',
      officeAddress: '19 Osierbrook Lane\nMilwaukee, Wisconsin',
      contactEmail: 'shop@cedarbend.example',
      dieKinds: ['flat'],
      maxBoardWidthIn: 28,
      maxBoardLengthIn: 40,
      ruleHeightsIn: [0.937],
      makesCounters: false,
      fitsEjectionRubber: true,
      laserCutBoards: false,
    },
    users: [
      { email: 'lena@cedarbend.example', name: 'Lena Marsh', role: 'estimator' },
      { email: 'oscar@cedarbend.example', name: 'Oscar Lind', role: 'admin' },
    ],
  },
];

/** A demo organisation's profile as columns of `organisations` (delivery points are JSON). */
export function profileColumns(profile: OrganisationProfileUpdate): Record<string, unknown> {
  const { deliveryPoints, ...rest } = profile;
  return deliveryPoints ? { ...rest, deliveryPoints: JSON.stringify(deliveryPoints) } : rest;
}
