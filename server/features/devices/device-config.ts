import { createHash } from 'node:crypto';
import { planWindowStart } from '@/shared/domain/workshop';

/** A configuration version's ETag for the current plan window (the document itself: buildDeviceConfig in shared/domain). */
export function etagFor(version: string, nowMs: number) {
  return `"${createHash('sha1')
    .update(`${version}|${planWindowStart(nowMs)}`)
    .digest('base64url')}"`;
}
