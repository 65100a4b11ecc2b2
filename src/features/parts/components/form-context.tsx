import { createContext, useContext } from 'react';

export type PartFormContextValue = {
  /** The message for a field's API path (or one of its sub-paths), once it should show. */
  errorAt: (path: string) => string | undefined;
  /** Marks a field as visited, so its message shows from now on. */
  touch: (path: string) => void;
};

const PartFormContext = createContext<PartFormContextValue>({ errorAt: () => undefined, touch: () => {} });

export const PartFormProvider = PartFormContext.Provider;
export const usePartForm = () => useContext(PartFormContext);
