/// <reference types="vite/client" />

interface ImportMetaEnv {
  // "false" hides the demo sign-in list (any other value, or none, shows it).
  readonly VITE_DEMO?: string;
}

interface ImportMeta {
  readonly env: ImportMetaEnv;
}
