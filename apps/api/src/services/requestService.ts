import type { z } from 'zod';
import type { DieRequestCreate, DieRequestDetail, DieRequestUpdate } from '@kerfmark/contracts';
import type { DieShopsQuery, OpenRequestsQuery, RequestListQuery } from '@kerfmark/contracts';
import type { AuthUser } from '../auth/passport';
import type { ServiceDeps } from './deps';
import { requestDetail } from './requests/requestDetail';
import { createRequest, updateRequest } from './requests/requestEdits';
import { cancelRequest, publishRequest } from './requests/requestLifecycle';
import { boardVersion } from './requests/boardVersion';
import { listOwnRequests, openRequestsFor } from './requests/requestLists';
import { shopChoices } from './requests/shopChoices';
import { factsFor, findOwned, findVisible, visibleQuery } from './requests/requestLookup';
import { answerQuestion, askQuestion } from './requests/requestQuestions';

/** Die requests: each change answers with the request's page as the user now sees it. */
export function createRequestService(deps: ServiceDeps) {
  const { knex } = deps;
  const detail = (actor: AuthUser, id: number): Promise<DieRequestDetail> => requestDetail(knex, actor, id);
  return {
    visibleQuery,
    findVisible,
    findOwned,
    factsFor,
    detail,
    list: (actor: AuthUser, q: z.output<typeof RequestListQuery>) => listOwnRequests(actor, q),
    /** The die shops a printer may invite, each with how it fits the die so far. */
    dieShops: (actor: AuthUser, q: z.output<typeof DieShopsQuery>) => shopChoices(knex, actor, q),
    /** A page of the open requests a die shop may bid on, with its tag. */
    openRequests: (actor: AuthUser, q: z.output<typeof OpenRequestsQuery>) => openRequestsFor(knex, actor, q),
    /** The tag of a page of the open requests alone, to answer a reload that has it with 304. */
    boardVersion: (actor: AuthUser, q: z.output<typeof OpenRequestsQuery>) => boardVersion(knex, actor, q),
    create: async (actor: AuthUser, input: DieRequestCreate) => detail(actor, await createRequest(knex, actor, input)),
    update: async (actor: AuthUser, id: number, patch: DieRequestUpdate) => {
      await updateRequest(deps, actor, id, patch);
      return detail(actor, id);
    },
    publish: async (actor: AuthUser, id: number) => {
      await publishRequest(deps, actor, id);
      return detail(actor, id);
    },
    cancel: async (actor: AuthUser, id: number, reason: string) => {
      await cancelRequest(deps, actor, id, reason);
      return detail(actor, id);
    },
    ask: (actor: AuthUser, id: number, question: string) => askQuestion(knex, actor, id, question),
    answer: async (actor: AuthUser, id: number, questionId: number, answer: string) => {
      await findOwned(actor, id);
      return answerQuestion(actor, id, questionId, answer);
    },
  };
}
