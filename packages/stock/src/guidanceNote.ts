/** Carried by every answer that advises scoring or suggests a creasing rule or channel. */
export const GUIDANCE_NOTE =
  "Common practice, guidance only: confirm with the die maker. The die maker's and the press maker's instructions come first.";
