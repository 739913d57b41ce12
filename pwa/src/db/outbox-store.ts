// Unsent interviews on this device (table `outbox`). They stay here, signed in or not,
// until the server acknowledges them; the sync module of a later issue sends them.
import { useLiveQuery } from 'dexie-react-hooks';
import { db } from './plumbline-db';

export async function countUnsent(): Promise<number> {
  return db.outbox.count();
}

/** `undefined` while the device storage is being read. */
export function useUnsentCount(): number | undefined {
  return useLiveQuery(() => db.outbox.count(), []);
}
