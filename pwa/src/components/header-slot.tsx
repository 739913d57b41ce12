import { createContext, useContext, type ReactNode } from 'react';

// The shell puts its account button into every page header through this slot, so pages
// (which live in features) need not know about sign-in.
const HeaderSlotContext = createContext<ReactNode>(null);

export const HeaderSlotProvider = HeaderSlotContext.Provider;

export function useHeaderSlot(): ReactNode {
  return useContext(HeaderSlotContext);
}
