/**
 * The production server: `npm start`, `npm run demo` and the browser tests serve the built app
 * through this file, not the framework's stock serve command, so that body limits, the Origin
 * check, the socket's address and the CSP nonce are in place. `npm run build` bundles it to
 * build/serve/index.js (esbuild; packages stay imports from node_modules), which runs with plain
 * node: no TypeScript loader in the serving process. Environment: PORT (3000), HOST (all interfaces), APP_URL, TRUSTED_PROXIES,
 * CLIENT_ADDRESS_HEADER, NODE_ENV (production), FILE_STORE and S3_*; see the README's configuration table.
 */
import { createServer } from "node:http";
import path from "node:path";
import { pathToFileURL } from "node:url";
import type { ServerBuild } from "react-router";
import { fileStore } from "~/storage/storage.server";

// Before React loads: react and react-dom each pick their production or development build from
// NODE_ENV when first imported, and the two must agree.
process.env.NODE_ENV ??= "production";
const { createServerApp, parseTrustedProxies } = await import("./app");
/** build/, the folder above this file's bundle (build/serve/index.js). */
const buildDir = path.resolve(import.meta.dirname, "..");
const port = Number(process.env.PORT ?? 3000);
if (!Number.isInteger(port) || port < 0 || port > 65535) {
  console.error(`PORT must be a whole number from 0 to 65535 (got "${process.env.PORT}").`);
  process.exit(2);
}
const serverBuild = path.join(buildDir, "server/index.js");
const build = (await import(pathToFileURL(serverBuild).href).catch((error: Error) => {
  console.error(`Could not load ${serverBuild} (run npm run build first): ${error.message}`);
  process.exit(1);
})) as ServerBuild;

let app;
try {
  app = createServerApp({
    build,
    clientDir: path.join(buildDir, "client"),
    appUrl: process.env.APP_URL ?? `http://localhost:${port}`,
    production: process.env.NODE_ENV === "production",
    trustProxy: parseTrustedProxies(process.env.TRUSTED_PROXIES),
    clientAddressHeader: process.env.CLIENT_ADDRESS_HEADER,
    log: process.env.LOFTLINE_REQUEST_LOG !== "0",
  });
} catch (error) {
  console.error(`The server's configuration is not right: ${(error as Error).message}`);
  process.exit(2);
}

if (
  process.env.CLIENT_ADDRESS_HEADER &&
  !process.env.TRUSTED_PROXIES &&
  process.env.CLIENT_ADDRESS_HEADER !== "none"
) {
  console.warn(
    "[loftline] CLIENT_ADDRESS_HEADER is read only from TRUSTED_PROXIES, which is not set: the socket's address is used.",
  );
}

// Every request, also one that waits for "100 Continue", goes through the app: it answers
// "continue" only to a body it will read (server/react-router-handler.ts).
const server = createServer(app);
server.on("checkContinue", (req, res) => server.emit("request", req, res));
server.listen(port, process.env.HOST, () => {
  const address = server.address();
  const actual = typeof address === "object" && address ? address.port : port;
  console.log(`[loftline] serving the built app on http://localhost:${actual}`);
});
await checkFileStore();

/**
 * Says at start-up whether the file store (S3 bucket or local folder) can be used. A store that
 * cannot is reported clearly but does not stop the server: pages without files keep working and
 * file requests answer 503 until the store is back.
 */
async function checkFileStore() {
  let store;
  try {
    store = fileStore();
  } catch (error) {
    console.error(`[loftline] ${(error as Error).message}`);
    process.exit(2);
  }
  try {
    await store.check();
    console.log(`[loftline] uploaded files go to ${store.describe()}`);
  } catch (error) {
    console.error(
      `[loftline] ${(error as Error).message} (${store.describe()}). Uploads and photos answer 503 until it is fixed.`,
    );
  }
}

function stop() {
  server.close(() => process.exit(0));
  server.closeIdleConnections();
  setTimeout(() => process.exit(0), 5000).unref();
}
process.once("SIGTERM", stop);
process.once("SIGINT", stop);
