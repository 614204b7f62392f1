import { useMutation, useQuery, useQueryClient } from "@tanstack/react-query";
import { useState } from "react";
import { Button } from "@/components/ui/button";
import { FieldError, TextField } from "@/components/ui/field";
import { Select } from "@/components/ui/select";
import { toast } from "@/components/ui/toaster";
import { isApiError } from "@/lib/api-client";
import { assignJob } from "../api/jobs";
import { jobKeys, jobQueries } from "../api/queries";

/** Gives a sold project (or moves a job) to a crew member on a date. */
export function AssignForm({ projectId, title, initial }: { projectId: string; title: string; initial?: { crewUserId: string; scheduledFor: string } }) {
  const queryClient = useQueryClient();
  const crew = useQuery(jobQueries.crew());
  const [crewUserId, setCrewUserId] = useState(initial?.crewUserId ?? "");
  const [scheduledFor, setScheduledFor] = useState(initial?.scheduledFor ?? "");
  const assign = useMutation({
    mutationFn: assignJob,
    onSuccess: () => {
      toast.success(`${title}: crew assigned.`);
      void queryClient.invalidateQueries({ queryKey: jobKeys.all });
    },
  });
  const fields = assign.error && isApiError(assign.error) ? assign.error.fields : {};
  const crewId = `crew-${projectId}`;
  const dateId = `date-${projectId}`;
  return (
    <form
      className="grid gap-3 sm:grid-cols-[1fr_12rem_auto] sm:items-start"
      aria-label={`Assign ${title}`}
      onSubmit={(event) => {
        event.preventDefault();
        assign.mutate({ projectId, input: { crewUserId, scheduledFor } });
      }}
    >
      <Select
        label="Crew"
        id={crewId}
        value={crewUserId}
        onChange={(e) => setCrewUserId(e.target.value)}
        required
        error={fields.crewUserId}
        options={[
          { value: "", label: crew.data?.length === 0 ? "No crew members yet: invite one under Team" : "Choose…" },
          ...(crew.data ?? []).map((c) => ({ value: c.id, label: c.name })),
        ]}
      />
      <TextField label="Install date" id={dateId} type="date" value={scheduledFor} onChange={(e) => setScheduledFor(e.target.value)} required error={fields.scheduledFor} />
      <Button type="submit" className="sm:mt-7" isLoading={assign.isPending} loadingText="Assigning…">{initial ? "Move" : "Assign"}</Button>
      {assign.isError && Object.keys(fields).length === 0 ? <FieldError className="sm:col-span-3">{assign.error.message}</FieldError> : null}
    </form>
  );
}
