import {
  dieShopProfileFields,
  printerProfileFields,
  type CuttingRuleHeightIn,
  type DieKind,
  type OrganisationProfileDto,
  type OrganisationProfileUpdate,
} from '@kerfmark/contracts';
import { computed, reactive, watch, type Ref } from 'vue';

/** The profile as the form edits it: empty boxes are empty strings. */
export interface ProfileForm {
  legalName: string;
  officeAddress: string;
  postcode: string;
  contactEmail: string;
  paymentTerms: string;
  /** Undefined while the box is empty. */
  paymentNetDays: number | undefined;
  deliveryPoints: Array<{ name: string; address: string; postcode: string }>;
  dieKinds: DieKind[];
  /** Undefined while the box is empty, as ant-design-vue's number input has it. */
  maxBoardWidthIn: number | undefined;
  maxBoardLengthIn: number | undefined;
  ruleHeightsIn: CuttingRuleHeightIn[];
  makesCounters: boolean | null;
  fitsEjectionRubber: boolean | null;
  laserCutBoards: boolean | null;
}

const COMMON_FIELDS = ['legalName', 'officeAddress', 'postcode', 'contactEmail'] as const;

const emptyForm = (): ProfileForm => ({
  legalName: '',
  officeAddress: '',
  postcode: '',
  contactEmail: '',
  paymentTerms: '',
  paymentNetDays: undefined,
  deliveryPoints: [],
  dieKinds: [],
  maxBoardWidthIn: undefined,
  maxBoardLengthIn: undefined,
  ruleHeightsIn: [],
  makesCounters: null,
  fitsEjectionRubber: null,
  laserCutBoards: null,
});

export function profileToForm(profile: OrganisationProfileDto): ProfileForm {
  const text = (value: string | null | undefined) => value ?? '';
  const base: ProfileForm = {
    ...emptyForm(),
    legalName: text(profile.legalName),
    officeAddress: text(profile.officeAddress),
    postcode: text(profile.postcode),
    contactEmail: text(profile.contactEmail),
  };
  if (profile.kind === 'printer') {
    return {
      ...base,
      paymentTerms: text(profile.paymentTerms),
      paymentNetDays: profile.paymentNetDays ?? undefined,
      deliveryPoints: profile.deliveryPoints.map((p) => ({ ...p, postcode: text(p.postcode) })),
    };
  }
  return {
    ...base,
    dieKinds: [...profile.dieKinds],
    maxBoardWidthIn: profile.maxBoardWidthIn ?? undefined,
    maxBoardLengthIn: profile.maxBoardLengthIn ?? undefined,
    ruleHeightsIn: [...profile.ruleHeightsIn],
    makesCounters: profile.makesCounters,
    fitsEjectionRubber: profile.fitsEjectionRubber,
    laserCutBoards: profile.laserCutBoards,
  };
}

/** A field's value as the API takes it: text trimmed, an empty box as null. */
function apiValue(form: ProfileForm, field: keyof ProfileForm): unknown {
  const blankToNull = (v: string) => (v.trim() === '' ? null : v.trim());
  const value = form[field];
  if (typeof value === 'string') return blankToNull(value);
  if (field === 'deliveryPoints')
    return form.deliveryPoints.map((p) => ({
      name: p.name.trim(),
      address: p.address.trim(),
      postcode: blankToNull(p.postcode),
    }));
  // Sets are compared without regard to the order they were ticked in.
  if (field === 'dieKinds') return [...form.dieKinds].sort();
  if (field === 'ruleHeightsIn') return [...form.ruleHeightsIn].sort();
  return value ?? null;
}

/** The fields the form changed from the profile, and only those: an update names only what changed. */
export function profileChanges(profile: OrganisationProfileDto, form: ProfileForm): OrganisationProfileUpdate {
  const original = profileToForm(profile);
  const fields = [...COMMON_FIELDS, ...(profile.kind === 'printer' ? printerProfileFields : dieShopProfileFields)];
  const changes: Record<string, unknown> = {};
  for (const field of fields) {
    const value = apiValue(form, field);
    if (JSON.stringify(value) !== JSON.stringify(apiValue(original, field))) changes[field] = value;
  }
  return changes as OrganisationProfileUpdate;
}

/** The form of a loaded profile: set again whenever the profile is (re)loaded. */
export function useProfileForm(profile: Ref<OrganisationProfileDto | undefined>) {
  const form = reactive<ProfileForm>(emptyForm());
  const reset = () => {
    if (profile.value) Object.assign(form, profileToForm(profile.value));
  };
  watch(profile, reset, { immediate: true });
  const changes = computed(() => (profile.value ? profileChanges(profile.value, form) : {}));
  const changed = computed(() => Object.keys(changes.value).length > 0);
  return { form, changes, changed, reset };
}
