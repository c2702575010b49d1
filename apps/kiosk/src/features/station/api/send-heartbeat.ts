import { apiPost } from '@/lib/api-client';

/** Tells the server this station is alive; the server keeps it as the station's last contact. */
export function sendHeartbeat() {
  return apiPost('/station/heartbeat');
}
