// The PostgreSQL store of transition sweeps.
import "server-only";
import { listStoredSweeps, storeSweeps } from "@/db/queries/sweeps";
import type { SweepStore } from "./show-sweeps";

export const sweepStore: SweepStore = { list: listStoredSweeps, save: storeSweeps };
