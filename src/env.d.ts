/// <reference types="astro/client" />

declare namespace App {
  interface Locals {
    /** The process-wide services (database, auth, mail, app address), handed to every endpoint. */
    app: import('./lib/server/app-services').AppServices;
    /** SI or US customary, from the person's preference (a cookie until accounts carry it). */
    unitSystem: import('./lib/preferences/unit-system').UnitSystem;
    /** The signed-in person, their permissions context and firms; null when signed out. */
    identity: import('./lib/server/auth/resolve-actor').ResolvedIdentity | null;
  }
}

declare module 'virtual:claybank/preview-worker' {
  /** File URL of the preview worker entry (see src/integrations/worker-entries.mjs). */
  const url: string;
  export default url;
}

declare module 'virtual:claybank/statistics-worker' {
  /** File URL of the statistics worker entry (see src/integrations/worker-entries.mjs). */
  const url: string;
  export default url;
}
