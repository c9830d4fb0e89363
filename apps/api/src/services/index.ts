import type { LoginLimiter } from '../auth/loginLimiter';
import { createAuthService } from './authService';
import type { ServiceDeps } from './deps';
import { createInvitationService } from './invitationService';
import { createPressService } from './pressService';
import { createOrganisationService } from './organisationService';
import { createUserService } from './userService';
import { createRequestService } from './requestService';
import { createFileService } from './fileService';
import { createBidService } from './bidService';
import { createAwardService } from './awardService';
import { createFulfilmentService } from './fulfilmentService';
import { createPurchaseDocumentService } from './purchaseDocumentService';
import { createDashboardService } from './dashboardService';
import { createInboxService } from './inboxService';
import { createPreferenceService } from './preferenceService';
import { createPriceHistoryService } from './priceHistoryService';
import { createLibraryService } from './libraryService';
import { createRateCardService } from './rateCardService';
import { createHolidayService } from './holidayService';
import { createInvoiceService } from './invoiceService';

export function createServices(deps: ServiceDeps, limiter: LoginLimiter) {
  const requests = createRequestService(deps);
  const priceHistory = createPriceHistoryService(deps);
  const library = createLibraryService(deps);
  const purchaseDocuments = createPurchaseDocumentService(deps);
  return {
    library,
    requests,
    files: createFileService(deps),
    bids: createBidService(deps, priceHistory),
    awards: createAwardService(deps, requests, purchaseDocuments),
    purchaseDocuments,
    fulfilment: createFulfilmentService(deps, { requests, library, priceHistory }),
    invoices: createInvoiceService(deps),
    dashboard: createDashboardService(deps, priceHistory),
    priceHistory,
    auth: createAuthService(deps, limiter),
    users: createUserService(deps),
    invitations: createInvitationService(deps),
    presses: createPressService(deps),
    holidays: createHolidayService(deps),
    organisation: createOrganisationService(deps),
    rateCards: createRateCardService(deps),
    inbox: createInboxService(),
    preferences: createPreferenceService(),
  };
}

export type Services = ReturnType<typeof createServices>;
