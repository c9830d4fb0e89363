import type { RequestQuestionDto } from '@kerfmark/contracts';
import type { Knex } from 'knex';
import { assertMay, loadFacts, questionDto } from '../../access';
import type { AuthUser } from '../../auth/passport';
import { notFound } from '../../lib/httpError';
import { RequestQuestion } from '../../models';

/** A die shop asks the printer about an open request; the access rules say when it may. */
export async function askQuestion(
  knex: Knex,
  actor: AuthUser,
  id: number,
  question: string,
): Promise<RequestQuestionDto> {
  const found = await knex.transaction((trx) => loadFacts(trx, id));
  if (!found) throw notFound('That die request');
  assertMay(actor, found.facts, 'ask');
  const row = await RequestQuestion.query().insertAndFetch({
    requestId: id,
    shopId: actor.organisationId,
    askedBy: actor.id,
    question,
  });
  return questionDto(actor, row);
}

/** The printer answers a question on its own request (the caller checks it is the owner); every shop then sees it. */
export async function answerQuestion(
  actor: AuthUser,
  id: number,
  questionId: number,
  answer: string,
): Promise<RequestQuestionDto> {
  const question = await RequestQuestion.query().findOne({ id: questionId, requestId: id });
  if (!question) throw notFound('That question');
  const row = await question.$query().patchAndFetch({ answer, answeredBy: actor.id, answeredAt: new Date() });
  return questionDto(actor, row);
}
