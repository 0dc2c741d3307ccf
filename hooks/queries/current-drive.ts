import { useMutation } from "@tanstack/react-query";
import { fetchJson } from "@/lib/api/client";

/** PUT /api/me/drive: the drive the person works on from now on. */
export function putCurrentDrive(driveId: string, signal?: AbortSignal) {
  return fetchJson<{ driveId: string }>("/api/me/drive", { method: "PUT", json: { driveId }, signal });
}

/**
 * Remembers a drive the person chose in a picker, so the next page where cans
 * are entered opens on it. The choice on this page is already made; a failure
 * only means the next page may open on another drive, and says so.
 */
export function useRememberDrive() {
  const mutation = useMutation({ mutationFn: (driveId: string) => putCurrentDrive(driveId) });
  return {
    remember: (driveId: string) => mutation.mutate(driveId),
    error: mutation.error ? `Could not remember this drive for your next visit: ${mutation.error.message}` : null,
  };
}
