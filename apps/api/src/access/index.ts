// Who may see and change what: the one place the rules live. Services and queries ask here.
export type { Actor, RequestFacts } from './facts';
export { bidsOpened, biddingOpen, sealOnCancel } from './sealed';
export { maySee, visibleParts, type VisibleParts } from './visibility';
export { actionRefusal, openActions, transitionRefusal, type RequestAction, type StatusAction } from './actions';
export { deadlineMoveRefusal, MIN_DEADLINE_NOTICE_MS, type Refusal } from './deadline';
export { visibleTo } from './visibleQuery';
export { biddableByShop, openToShop } from './openToShop';
export { factsOf, loadFacts, TIES_PART } from './loadFacts';
export { refuse, assertMay } from './refuse';
export { presentToOwner } from './presentToOwner';
export { presentToShop } from './presentToShop';
export { questionDto } from './presentRequest';
export { invoiceActionRefusal, invoiceStepRefusal, type InvoiceStep } from './invoiceRules';
