/// <reference types="vite/client" />

interface ImportMetaEnv {
  /** Where client accounts are sent: the storefront's address. */
  readonly VITE_STOREFRONT_URL?: string;
}

interface ImportMeta {
  readonly env: ImportMetaEnv;
}
