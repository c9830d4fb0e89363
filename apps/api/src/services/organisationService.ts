import {
  fieldsNotFor,
  orgKindLabels,
  type OrganisationProfileDto,
  type OrganisationProfileUpdate,
} from '@kerfmark/contracts';
import type { Knex } from 'knex';
import type { AuthUser } from '../auth/passport';
import { toOrganisationProfile } from '../dto/organisationProfile';
import { badRequest } from '../lib/httpError';
import { Organisation } from '../models';
import { recordAudit } from './auditService';
import type { ServiceDeps } from './deps';

const editable = (actor: AuthUser) => actor.role === 'admin';

/** The reader's own organisation's profile. */
export async function readProfile(actor: AuthUser): Promise<OrganisationProfileDto> {
  const org = await Organisation.query().findById(actor.organisationId).throwIfNotFound();
  return toOrganisationProfile(org, editable(actor));
}

/** Changes the fields named and no other; the route lets only the organisation's admins here. */
export async function updateProfile(
  knex: Knex,
  actor: AuthUser,
  patch: OrganisationProfileUpdate,
): Promise<OrganisationProfileDto> {
  const otherKinds = fieldsNotFor(actor.orgKind).filter((field) => field in patch);
  if (otherKinds.length > 0) {
    const kind = orgKindLabels[actor.orgKind].toLowerCase();
    throw badRequest(
      `Check these fields: ${otherKinds.join(', ')}.`,
      Object.fromEntries(otherKinds.map((field) => [field, `A ${kind}’s profile has no such field`])),
    );
  }
  return knex.transaction(async (trx) => {
    const org = await Organisation.query(trx).findById(actor.organisationId).forUpdate().throwIfNotFound();
    // The largest die board is both sides or neither, after this change as before it.
    const width = patch.maxBoardWidthIn !== undefined ? patch.maxBoardWidthIn : org.maxBoardWidthIn;
    const length = patch.maxBoardLengthIn !== undefined ? patch.maxBoardLengthIn : org.maxBoardLengthIn;
    if ((width === null) !== (length === null)) {
      const missing = width === null ? 'maxBoardWidthIn' : 'maxBoardLengthIn';
      throw badRequest('Enter both sides of the largest die board, or clear both.', {
        [missing]: width === null ? 'Enter the width too' : 'Enter the length too',
      });
    }
    const updated = await org.$query(trx).patchAndFetch(patch);
    await recordAudit(trx, {
      organisationId: org.id,
      actorUserId: actor.id,
      entity: 'organisation',
      entityId: org.id,
      action: 'profile_updated',
      detail: { ...patch },
    });
    return toOrganisationProfile(updated, editable(actor));
  });
}

/** The organisation's profile: every member reads it, its admins keep it. */
export function createOrganisationService({ knex }: ServiceDeps) {
  return {
    profile: readProfile,
    updateProfile: (actor: AuthUser, patch: OrganisationProfileUpdate) => updateProfile(knex, actor, patch),
  };
}
