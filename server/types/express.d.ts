import type { SessionUser } from '@/shared/api/contracts';

declare global {
  namespace Express {
    // eslint-disable-next-line @typescript-eslint/no-empty-object-type -- declaration merging needs an interface, which adds nothing of its own
    interface User extends SessionUser {}
  }
}
export {};
