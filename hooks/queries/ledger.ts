import { queryOptions } from "@tanstack/react-query";
import { fetchJson } from "@/lib/api/fetch-json";
import type { DriveStock } from "@/lib/ledger/schemas";

export interface OpenHaul {
  id: string;
  movementId: string;
  dropPointId: string;
  dropPointName: string;
  bags: number;
  weightKg: number | null;
  estimatedCans: number;
  hauledAt: string;
  sorted: boolean;
}

export interface MyEntry {
  movementId: string;
  kind: string;
  occurredAt: string;
  drive: string;
  dropPoint: string | null;
  details: Record<string, unknown>;
  counted: number;
  estimated: number;
  undone: boolean;
}

export const ledgerKeys = {
  all: ["ledger"] as const,
  stock: (driveId: string) => ["ledger", "stock", driveId] as const,
  openHauls: (driveId: string) => ["ledger", "hauls", driveId, "open"] as const,
  mine: () => ["ledger", "mine"] as const,
  list: (filters: Record<string, string>) => ["ledger", "list", filters] as const,
};

export const stockQuery = (driveId: string) =>
  queryOptions({ queryKey: ledgerKeys.stock(driveId), queryFn: () => fetchJson<DriveStock>(`/api/drives/${driveId}/stock`), enabled: !!driveId });

export const openHaulsQuery = (driveId: string) =>
  queryOptions({ queryKey: ledgerKeys.openHauls(driveId), queryFn: () => fetchJson<OpenHaul[]>(`/api/drives/${driveId}/hauls?open=1`), enabled: !!driveId });

export const myEntriesQuery = () => queryOptions({ queryKey: ledgerKeys.mine(), queryFn: () => fetchJson<MyEntry[]>(`/api/ledger?mine=1`) });
