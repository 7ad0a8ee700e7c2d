/** A computation that can be refused: either its value, or a reason a person can act on. */
export type Refusal = { ok: false; reason: string };
export type Result<T extends object> = ({ ok: true } & T) | Refusal;

export function refuse(reason: string): Refusal {
  return { ok: false, reason };
}
