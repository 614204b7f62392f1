import { useMutation, useQuery, useQueryClient } from "@tanstack/react-query";
import { useState } from "react";
import { Button } from "@/components/ui/button";
import { FieldError, Label, controlStyles } from "@/components/ui/field";
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
      className="grid gap-3 sm:grid-cols-[1fr_auto_auto] sm:items-end"
      aria-label={`Assign ${title}`}
      onSubmit={(event) => {
        event.preventDefault();
        assign.mutate({ projectId, input: { crewUserId, scheduledFor } });
      }}
    >
      <div>
        <Label htmlFor={crewId}>Crew</Label>
        <select id={crewId} className={controlStyles} value={crewUserId} onChange={(e) => setCrewUserId(e.target.value)} required>
          <option value="">{crew.data?.length === 0 ? "No crew members yet: invite one under Team" : "Choose…"}</option>
          {(crew.data ?? []).map((c) => <option key={c.id} value={c.id}>{c.name}</option>)}
        </select>
        <FieldError>{fields.crewUserId}</FieldError>
      </div>
      <div>
        <Label htmlFor={dateId}>Install date</Label>
        <input id={dateId} type="date" className={controlStyles} value={scheduledFor} onChange={(e) => setScheduledFor(e.target.value)} required />
        <FieldError>{fields.scheduledFor}</FieldError>
      </div>
      <Button type="submit" isLoading={assign.isPending} loadingText="Assigning…">{initial ? "Move" : "Assign"}</Button>
      {assign.isError && Object.keys(fields).length === 0 ? <FieldError className="sm:col-span-3">{assign.error.message}</FieldError> : null}
    </form>
  );
}
