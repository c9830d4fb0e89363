import type { OrganisationProfileDto } from '@kerfmark/contracts';
import type { Organisation } from '../models';

/** An organisation's profile as its members read it; only its kind's fields. */
export function toOrganisationProfile(org: Organisation, editable: boolean): OrganisationProfileDto {
  const common = {
    organisationId: org.id,
    name: org.name,
    legalName: org.legalName,
    officeAddress: org.officeAddress,
    postcode: org.postcode,
    contactEmail: org.contactEmail,
    editable,
  };
  if (org.kind === 'printer') {
    return {
      ...common,
      kind: 'printer',
      paymentTerms: org.paymentTerms,
      paymentNetDays: org.paymentNetDays,
      deliveryPoints: org.deliveryPoints,
    };
  }
  return {
    ...common,
    kind: 'die_shop',
    dieKinds: org.dieKinds,
    maxBoardWidthIn: org.maxBoardWidthIn,
    maxBoardLengthIn: org.maxBoardLengthIn,
    ruleHeightsIn: org.ruleHeightsIn,
    makesCounters: org.makesCounters,
    fitsEjectionRubber: org.fitsEjectionRubber,
    laserCutBoards: org.laserCutBoards,
  };
}
