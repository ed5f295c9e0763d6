/// <reference types="vite/client" />

interface ImportMetaEnv {
  /** Minutes without activity before a signed-in tab signs out (default 15); read in config/env.ts. */
  readonly VITE_IDLE_SIGN_OUT_MINUTES?: string;
}

interface ImportMeta {
  readonly env: ImportMetaEnv;
}
