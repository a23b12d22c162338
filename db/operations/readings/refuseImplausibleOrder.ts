import { DomainError } from '../../../src/errors/DomainError.ts';
import type { Db } from '../../Db.ts';
import type { Actor } from '../Actor.ts';
import { implausibleOrderMessage } from './implausibleOrderMessage.ts';
import { readPlausibilityContexts } from './readPlausibilityContexts.ts';

/**
 * Refuses a reading whose fringe order the model could not show without breaking (a slip, not
 * a measurement), with the limit and how it was reached, before anything is stored.
 */
export async function refuseImplausibleOrder(db: Db, actor: Actor, siteId: string, reading: { fringeOrder: number; wavelengthNm: number | null }): Promise<void> {
  const context = (await readPlausibilityContexts(db, actor.labId, [siteId])).get(siteId);
  if (!context) throw new DomainError('not_found', `No site ${siteId} in this lab.`);
  const message = implausibleOrderMessage(context, reading);
  if (message) throw new DomainError('implausible_value', `The reading was not stored: ${message}.`, [{ field: 'reading', message }]);
}
