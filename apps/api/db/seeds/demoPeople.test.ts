import { fieldsNotFor, OrganisationProfileUpdate } from '@kerfmark/contracts';
import { describe, expect, it } from 'vitest';
import { demoOrganisations } from './demoPeople';

describe('the demo organisations’ profiles', () => {
  it.each(demoOrganisations.map((org) => [org.name, org] as const))('%s: a valid profile of its kind', (_name, org) => {
    expect(OrganisationProfileUpdate.parse(org.profile)).toEqual(org.profile);
    expect(fieldsNotFor(org.kind).filter((field) => field in org.profile)).toEqual([]);
    expect(org.profile.legalName).toBeTruthy();
    expect(org.profile.officeAddress).toBeTruthy();
  });

  it('give the die shops different capabilities to choose between', () => {
    const shops = demoOrganisations.filter((org) => org.kind === 'die_shop').map((org) => org.profile);
    expect(shops.some((p) => p.dieKinds?.includes('rotary'))).toBe(true);
    expect(shops.some((p) => p.laserCutBoards === false)).toBe(true);
    expect(shops.some((p) => p.makesCounters === false)).toBe(true);
    expect(new Set(shops.map((p) => p.maxBoardWidthIn)).size).toBe(shops.length);
  });
});
