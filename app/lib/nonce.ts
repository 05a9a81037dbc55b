import { createContext, useContext } from "react";

/**
 * The Content-Security-Policy nonce of the page being rendered on the server (the server entry
 * makes one per response and puts it in the policy); undefined in the browser and in development.
 */
export const NonceContext = createContext<string | undefined>(undefined);

export function useNonce(): string | undefined {
  return useContext(NonceContext);
}
