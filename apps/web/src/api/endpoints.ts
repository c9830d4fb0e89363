import type { Complexity } from '@kerfmark/dieline';
import type {
  DieShopChoices,
  LengthUnits,
  DisplayLocale,
  CalibrationDto,
  EstimateDto,
  RateCardDto,
  RateCardInput,
  LibraryDieDto,
  HolidayCreate,
  HolidayDto,
  HolidayPlacesDto,
  HolidayYearDto,
  PublicHolidaysLoad,
  PublicHolidaysLoadedDto,
  PriceRecordDto,
  DashboardDto,
  NotificationKind,
  PreferencesDto,
  BidComparisonDto,
  BidDto,
  BidInput,
  NotificationDto,
  DielineFileDto,
  DieRequestCreate,
  DieRequestDetail,
  DieRequestSummary,
  OpenRequestRow,
  DieRequestUpdate,
  Invitation,
  Page,
  RequestQuestionDto,
  InvitationAccept,
  InvitationCreate,
  InvitationPreview,
  LoginInput,
  LoginResult,
  Me,
  OrganisationProfileDto,
  OrganisationProfileUpdate,
  Press,
  PressCreate,
  PressUpdate,
  User,
  UserUpdate,
} from '@kerfmark/contracts';
import type { DielinePreview } from '@kerfmark/dieline';
import { api } from './client';

export const authApi = {
  login: (input: LoginInput) => api<LoginResult>('/auth/login', { method: 'POST', body: input }),
  logout: () => api<void>('/auth/logout', { method: 'POST' }),
  me: () => api<Me>('/me'),
};

export const usersApi = {
  list: () => api<User[]>('/users'),
  invite: (input: InvitationCreate) => api<Invitation>('/users', { method: 'POST', body: input }),
  update: (id: number, patch: UserUpdate) => api<User>(`/users/${id}`, { method: 'PATCH', body: patch }),
};

export const invitationsApi = {
  list: () => api<Invitation[]>('/invitations'),
  resend: (id: number) => api<Invitation>(`/invitations/${id}/resend`, { method: 'POST' }),
  revoke: (id: number) => api<Invitation>(`/invitations/${id}/revoke`, { method: 'POST' }),
  preview: (token: string) => api<InvitationPreview>(`/invitations/preview?token=${encodeURIComponent(token)}`),
  accept: (input: InvitationAccept) => api<LoginResult>('/invitations/accept', { method: 'POST', body: input }),
};

export const organisationApi = {
  profile: () => api<OrganisationProfileDto>('/organisation/profile'),
  updateProfile: (patch: OrganisationProfileUpdate) =>
    api<OrganisationProfileDto>('/organisation/profile', { method: 'PATCH', body: patch }),
};

export const pressesApi = {
  list: () => api<Press[]>('/presses'),
  create: (input: PressCreate) => api<Press>('/presses', { method: 'POST', body: input }),
  update: (id: number, patch: PressUpdate) => api<Press>(`/presses/${id}`, { method: 'PATCH', body: patch }),
};

type Query = Record<string, string | number | boolean | null | undefined>;

/** A query string of the values that are set. */
function searchParams(query: Query): URLSearchParams {
  const params = new URLSearchParams();
  for (const [key, value] of Object.entries(query))
    if (value !== undefined && value !== null && value !== '') params.set(key, String(value));
  return params;
}

export const requestsApi = {
  list: (query: Query) => api<Page<DieRequestSummary>>(`/requests?${searchParams(query)}`),
  get: (id: number) => api<DieRequestDetail>(`/requests/${id}`),
  create: (input: DieRequestCreate) => api<DieRequestDetail>('/requests', { method: 'POST', body: input }),
  update: (id: number, patch: DieRequestUpdate) =>
    api<DieRequestDetail>(`/requests/${id}`, { method: 'PATCH', body: patch }),
  publish: (id: number) => api<DieRequestDetail>(`/requests/${id}/publish`, { method: 'POST' }),
  cancel: (id: number, reason: string) =>
    api<DieRequestDetail>(`/requests/${id}/cancel`, { method: 'POST', body: { reason } }),
  ask: (id: number, question: string) =>
    api<RequestQuestionDto>(`/requests/${id}/questions`, { method: 'POST', body: { question } }),
  answer: (id: number, questionId: number, answer: string) =>
    api<RequestQuestionDto>(`/requests/${id}/questions/${questionId}/answer`, { method: 'POST', body: { answer } }),
  openRequests: (query: Query) => api<Page<OpenRequestRow>>(`/open-requests?${searchParams(query)}`),
  dieShops: (query: Query) => api<DieShopChoices>(`/die-shops?${searchParams(query)}`),
};

export const filesApi = {
  get: (id: number) => api<DielineFileDto>(`/files/${id}`),
  preview: (id: number) => api<{ preview: DielinePreview | null }>(`/files/${id}/preview`),
  download: (id: number) => api<{ url: string; expiresAt: string }>(`/files/${id}/download`),
  makePrimary: (id: number) => api<DielineFileDto>(`/files/${id}/primary`, { method: 'POST' }),
  remap: (id: number, layerMap: Record<string, string>) =>
    api<DielineFileDto>(`/files/${id}/layers`, { method: 'PUT', body: { layerMap } }),
  choosePage: (id: number, page: number | null) =>
    api<DielineFileDto>(`/files/${id}/page`, { method: 'PUT', body: { page } }),
  remove: (id: number) => api<void>(`/files/${id}`, { method: 'DELETE' }),
};

export const rateCardApi = {
  get: () => api<{ rateCard: RateCardDto | null }>('/rate-card'),
  save: (input: RateCardInput) => api<RateCardDto>('/rate-card', { method: 'PUT', body: input }),
  calibration: () => api<CalibrationDto>('/rate-card/calibration'),
  estimate: (requestId: number, leadDays: number, boardThicknessIn?: number) =>
    api<EstimateDto>(
      `/requests/${requestId}/estimate?leadDays=${leadDays}${boardThicknessIn ? `&boardThicknessIn=${boardThicknessIn}` : ''}`,
    ),
};

export const holidaysApi = {
  year: (year: number) => api<HolidayYearDto>(`/holidays?year=${year}`),
  places: (country?: string) =>
    api<HolidayPlacesDto>(`/holidays/regions${country ? `?country=${encodeURIComponent(country)}` : ''}`),
  add: (input: HolidayCreate) => api<HolidayDto>('/holidays', { method: 'POST', body: input }),
  loadPublic: (input: PublicHolidaysLoad) =>
    api<PublicHolidaysLoadedDto>('/holidays/public', { method: 'POST', body: input }),
  remove: (id: number) => api<void>(`/holidays/${id}`, { method: 'DELETE' }),
};

export const bidsApi = {
  submit: (requestId: number, input: BidInput) =>
    api<BidDto>(`/requests/${requestId}/bids`, { method: 'POST', body: input }),
  revise: (bidId: number, input: BidInput) => api<BidDto>(`/bids/${bidId}`, { method: 'PATCH', body: input }),
  withdraw: (bidId: number) => api<BidDto>(`/bids/${bidId}/withdraw`, { method: 'POST' }),
  decline: (requestId: number, reason: string) =>
    api<void>(`/requests/${requestId}/decline`, { method: 'POST', body: { reason } }),
  estimateAid: () =>
    api<Array<{ currency: string; dies: number; centsPerInch: number | null; centsPerBend: number | null }>>(
      '/estimate-aid',
    ),
  compare: (requestId: number) => api<BidComparisonDto>(`/requests/${requestId}/bids`),
  closeBidding: (requestId: number) =>
    api<DieRequestDetail>(`/requests/${requestId}/close-bidding`, { method: 'POST' }),
  award: (requestId: number, bidId: number, reason?: string) =>
    api<DieRequestDetail>(`/requests/${requestId}/award`, { method: 'POST', body: { bidId, reason } }),
  startProduction: (requestId: number) =>
    api<DieRequestDetail>(`/requests/${requestId}/start-production`, { method: 'POST' }),
  ship: (requestId: number, trackingNote: string) =>
    api<DieRequestDetail>(`/requests/${requestId}/ship`, { method: 'POST', body: { trackingNote } }),
  receive: (requestId: number, condition: 'good' | 'damaged', notes?: string) =>
    api<DieRequestDetail>(`/requests/${requestId}/receive`, { method: 'POST', body: { condition, notes } }),
};

export const notificationsApi = {
  list: () => api<{ items: NotificationDto[]; unread: number }>('/notifications'),
  read: (id: number) => api<void>(`/notifications/${id}/read`, { method: 'POST' }),
  readAll: () => api<void>('/notifications/read-all', { method: 'POST' }),
};

export const meApi = {
  dashboard: () => api<DashboardDto>('/me/dashboard'),
  preferences: () => api<PreferencesDto>('/me/preferences'),
  savePreferences: (email: Partial<Record<NotificationKind, boolean>>) =>
    api<PreferencesDto>('/me/preferences', { method: 'PUT', body: { email } }),
  /** Inches or millimetres, or the locale, for this user; null for the organisation's default. */
  saveDisplay: (change: { lengthUnits?: LengthUnits | null; locale?: DisplayLocale | null }) =>
    api<PreferencesDto>('/me/preferences', { method: 'PUT', body: change }),
};

export interface PriceFitView {
  currency: string | null;
  total: number;
  sampled: number;
  fit:
    | {
        enough: true;
        model: 'linear' | 'log';
        r2: number;
        residualStandardErrorCents: number;
        n: number;
        df: number;
        describe: string;
        coefficients: { intercept: number; perInch: number; perFeature: number };
      }
    | { enough: false; reason: string; needed: number };
  perInch: null | Record<
    Complexity,
    | { enough: true; n: number; q1Cents: number; medianCents: number; q3Cents: number }
    | { enough: false; reason: string }
  >;
  trend: null | {
    quarters: Array<{ quarter: string; n: number; medianCentsPerInch: number | null; changePct: number | null }>;
  };
  curve: Array<{ ruleLengthIn: number; lowCents: number; typicalCents: number; highCents: number }>;
  typicalFeatures?: number;
  points: Array<{
    ruleLengthIn: number;
    dieCents: number;
    complexity: Complexity;
    pricedOn: string;
    shopName: string;
    features: number;
  }>;
  shops: string[];
  rule: string;
}

export const priceHistoryApi = {
  list: (q: Query) => api<Page<PriceRecordDto>>(`/price-history?${searchParams(q)}`),
  fit: (q: Query) => api<PriceFitView>(`/price-history/fit?${searchParams(q)}`),
  exportUrl: (q: Query) => `/price-history/export.csv?${searchParams(q)}`,
  fairPrice: (requestId: number) =>
    api<{
      enough: boolean;
      reason?: string;
      band?: { lowCents: number; typicalCents: number; highCents: number; currency: string; extrapolated: boolean };
    }>(`/requests/${requestId}/fair-price`),
};

export const libraryApi = {
  list: () => api<LibraryDieDto[]>('/library'),
  get: (id: number) => api<LibraryDieDto & { preview: DielinePreview | null }>(`/library/${id}`),
  update: (id: number, patch: Record<string, unknown>) =>
    api<LibraryDieDto>(`/library/${id}`, { method: 'PATCH', body: patch }),
  addRun: (
    id: number,
    run: { runOn: string; impressions: number; jobReference?: string | null; notes?: string | null },
  ) => api<LibraryDieDto>(`/library/${id}/runs`, { method: 'POST', body: run }),
  matches: (requestId: number) => api<LibraryDieDto[]>(`/requests/${requestId}/library-matches`),
};
