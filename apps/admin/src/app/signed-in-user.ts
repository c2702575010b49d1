import type { User } from '@chuckkey/core';
import { useOutletContext } from 'react-router-dom';

export interface SignedInContext {
  user: User;
}

/** Only for pages under the signed-in layout, which renders them only once someone is signed in. */
export function useSignedInUser(): User {
  return useOutletContext<SignedInContext>().user;
}
