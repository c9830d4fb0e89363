import { mmToInches } from './units';

/** Bounds on time and memory: inputs past them are refused with a clear error. */
export interface Limits {
  /** Largest input accepted, in bytes. */
  maxBytes: number;
  /** Most drawing entities (after blocks are expanded) or SVG shapes accepted. */
  maxEntities: number;
  /** Most segments (lines, arcs, curves) accepted. */
  maxSegments: number;
  /** Most PDF drawing instructions run for a page, its forms included. */
  maxPdfOperators: number;
  /** Most bytes a PDF page's drawing instructions may unpack to. */
  maxPdfContentBytes: number;
}

export const DEFAULT_LIMITS: Limits = {
  maxBytes: 32 * 1024 * 1024,
  maxEntities: 200_000,
  maxSegments: 1_000_000,
  maxPdfOperators: 4_000_000,
  maxPdfContentBytes: 128 * 1024 * 1024,
};

/** Rule ends closer than this join (0.05 mm), in inches. */
export const JOIN_TOLERANCE_IN = mmToInches(0.05);

/** Segments shorter than this have no length and are dropped, in inches. */
export const ZERO_LENGTH_IN = 1e-7;

/** Maximum nesting of DXF blocks inside blocks. */
export const MAX_BLOCK_DEPTH = 32;
