// The project has no @types/react-dom; the DOM-rendered component tests use only this much of it.
declare module 'react-dom/client' {
  import type { ReactNode } from 'react';
  export type Root = { render(children: ReactNode): void; unmount(): void };
  export function createRoot(container: Element): Root;
}
