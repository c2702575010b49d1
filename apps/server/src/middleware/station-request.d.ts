import type { StationRecord } from '../modules/stations/stations.repository';

declare global {
  namespace Express {
    interface Request {
      /** The paired device that sent the request, set by requireStation. */
      station?: StationRecord;
    }
  }
}

export {};
