import { useLocalSearchParams } from 'expo-router';

/** The numeric id a route's address carries (`/stations/12` → 12), and whether it can name anything at all. */
export function useRouteId(param = 'id') {
  const raw = useLocalSearchParams<Record<string, string>>()[param];
  const id = Number(raw);
  return { id, raw: String(raw), valid: Number.isInteger(id) && id > 0 };
}
