/**
 * What the server entry (server/react-router-handler.ts) gives every loader and action as
 * `context`. Both are absent under `react-router dev` and in tests that call actions directly.
 */
declare module "react-router" {
  interface AppLoadContext {
    /** The client's address: the socket's peer, or a trusted proxy's report of it; null if unknown. */
    clientAddress?: string | null;
    /** This response's Content-Security-Policy nonce, for the framework's inline scripts. */
    cspNonce?: string;
  }
}

export {};
