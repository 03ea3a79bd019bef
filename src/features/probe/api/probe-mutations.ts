import { useMutation, useQueryClient } from "@tanstack/react-query";
import { apiPaths } from "../../../../shared/schemas/api-paths";
import type { ProbeSearchInput, ProbeView } from "../../../../shared/schemas/probes";
import { api } from "../../../lib/api-client";
import { probeKeys } from "./probe-queries";

/** What the upload form sends: files and the text fields of POST /api/probes. */
export interface ProbeUpload {
  matrix: File;
  input?: File | null;
  mu: number;
  nonlinearity: string;
  title?: string;
  groupId?: string;
}

function formOf(u: ProbeUpload): FormData {
  const form = new FormData();
  form.set("mu", String(u.mu));
  form.set("nonlinearity", u.nonlinearity);
  if (u.title) form.set("title", u.title);
  if (u.groupId) form.set("groupId", u.groupId);
  form.set("matrix", u.matrix, u.matrix.name);
  if (u.input) form.set("input", u.input, u.input.name);
  return form;
}

export function useUploadProbe() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (u: ProbeUpload) => api.upload<ProbeView>(apiPaths.probes.list, formOf(u)),
    onSuccess: (probe) => {
      queryClient.setQueryData(probeKeys.detail(probe.id), probe);
      return queryClient.invalidateQueries({ queryKey: probeKeys.lists() });
    },
    meta: { inlineErrors: true, successMessage: "Matrix uploaded." },
  });
}

export function useStartSearch(id: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (settings: ProbeSearchInput) => api.post<ProbeView>(apiPaths.probes.search(id), settings),
    onSuccess: (probe) => {
      queryClient.setQueryData(probeKeys.detail(id), probe);
      return queryClient.invalidateQueries({ queryKey: probeKeys.lists() });
    },
    meta: { inlineErrors: true, successMessage: "Search queued." },
  });
}

export function useDeleteProbe(id: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: () => api.delete<void>(apiPaths.probes.detail(id)),
    onSuccess: () => {
      queryClient.removeQueries({ queryKey: probeKeys.detail(id) });
      return queryClient.invalidateQueries({ queryKey: probeKeys.lists() });
    },
    meta: { successMessage: "Probe deleted." },
  });
}
