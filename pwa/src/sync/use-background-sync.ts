// Keeps the outbox moving while an interviewer's screens are open: screens call the hook,
// the schedule itself lives in sync-scheduler (one for the whole app).
import { useEffect } from 'react';
import { startSyncSchedule } from './sync-scheduler';

export function useBackgroundSync(): void {
  useEffect(() => startSyncSchedule(), []);
}
