import type { ShopPolicies } from '@chuckkey/core';
import type { Deps } from '../../lib/deps';
import { auditLog } from '../audit/audit.repository';
import { shopPoliciesRepository } from './shop-policies.repository';

/** The shop's policies that clearance reads (rule 8), as Setup edits them. */
export function shopPoliciesService({ db }: Deps) {
  return {
    async get(): Promise<ShopPolicies> {
      return shopPoliciesRepository(db).get();
    },

    /** Replaces the policies, with their before and after in the audit log. */
    async replace(actor: Express.User, input: ShopPolicies): Promise<ShopPolicies> {
      return db.transaction(async (trx) => {
        const repository = shopPoliciesRepository(trx);
        const before = await repository.getForUpdate();
        await repository.replace(input);
        await auditLog(trx).record({ actorId: actor.id, action: 'shop.policies_changed', entity: 'shop', entityId: '1', details: { before, after: input } });
        return repository.get();
      });
    },
  };
}
