import { describe, expect, it } from 'vitest';
import {
  DieRequestUpdate,
  LibraryDieUpdate,
  OrganisationProfileUpdate,
  PreferencesUpdate,
  PressUpdate,
  UserUpdate,
} from './index';
import { z } from 'zod';

// zod 4 docs (.partial()): optional fields that carry a .default() still take the default when the
// key is missing. An update schema must hand back exactly the keys it was given.
describe('update schemas', () => {
  const cases = [
    ['DieRequestUpdate', DieRequestUpdate, { notes: 'Call before delivery' }],
    ['PressUpdate', PressUpdate, { name: 'Platen 2' }],
    ['LibraryDieUpdate', LibraryDieUpdate, { storageLocation: 'Rack B' }],
    ['UserUpdate', UserUpdate, { role: 'buyer' }],
    ['PreferencesUpdate', PreferencesUpdate, { email: { shipped: false } }],
    ['OrganisationProfileUpdate', OrganisationProfileUpdate, { paymentTerms: 'Net 30' }],
  ] as const;

  it.each(cases)('%s adds no field the update did not name', (_name, schema, body) => {
    expect(Object.keys(schema.parse(body)).sort()).toEqual(Object.keys(body).sort());
  });
});

describe('every update schema', () => {
  it('has no field with a default, at any exported *Update', async () => {
    const contracts: Record<string, unknown> = await import('./index');
    const updates = Object.entries(contracts).filter(
      ([name, value]) => name.endsWith('Update') && value instanceof z.ZodObject,
    );
    expect(updates.length).toBeGreaterThanOrEqual(5);
    for (const [name, schema] of updates) {
      for (const [field, type] of Object.entries((schema as z.ZodObject).shape)) {
        expect(
          type instanceof z.ZodDefault || (type instanceof z.ZodOptional && type.unwrap() instanceof z.ZodDefault),
          `${name}.${field}`,
        ).toBe(false);
      }
    }
  });
});
