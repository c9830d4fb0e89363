import { readFileSync } from 'node:fs';
import Ajv from 'ajv-draft-04';
import addFormats from 'ajv-formats';

// The Open Contracting Data Standard 1.1.5 release schema and the OCDS bids extension's patch
// (tests/reference/ocds/README.md), merged as the extension mechanism says: JSON Merge Patch.
const reference = (name: string): unknown =>
  JSON.parse(readFileSync(new URL(`../../../../tests/reference/ocds/${name}`, import.meta.url), 'utf8'));

/** JSON Merge Patch, RFC 7386 section 2: objects merge key by key, null deletes, anything else replaces. */
export function mergePatch(target: unknown, patch: unknown): unknown {
  const isObject = (v: unknown): v is Record<string, unknown> =>
    typeof v === 'object' && v !== null && !Array.isArray(v);
  if (!isObject(patch)) return patch;
  const result: Record<string, unknown> = isObject(target) ? { ...target } : {};
  for (const [key, value] of Object.entries(patch)) {
    if (value === null) delete result[key];
    else result[key] = mergePatch(result[key], value);
  }
  return result;
}

export const releaseSchema = mergePatch(
  reference('release-schema-1.1.5.json'),
  reference('bid-extension-release-schema.json'),
);

// OCDS 1.1 schemas are JSON Schema draft-04 and carry their own keywords (codelist, openCodelist…).
const ajv = new Ajv({ strict: false, allErrors: true });
addFormats(ajv);
export const validateRelease = ajv.compile(releaseSchema as object);
export const errorsText = (errors: Parameters<typeof ajv.errorsText>[0]) => ajv.errorsText(errors);
