"use client";

import { useHydrated } from "@/components/ui/use-hydrated";
import { useRef, useState } from "react";
import { useRouter } from "next/navigation";
import { checkRoster, rosterFileProblem, rosterLimits, type RosterCheck, type RosterProblem } from "@/lib/members/roster-import";
import type { RosterImportReport } from "@/lib/data/member-admin";
import { roleLabels } from "@/lib/auth/roles";
import { TextField } from "@/components/ui/field";
import { Button } from "@/components/ui/button";
import { LiveStatus, Notice } from "@/components/ui/notice";
import { importRosterAction } from "../actions";
import { reachAction } from "@/lib/http/reach-action";

const fieldLabels: Record<RosterProblem["field"], string> = { name: "name", email: "email", role: "role", row: "whole row" };

function ProblemTable({ problems, caption, testId }: { problems: RosterProblem[]; caption: string; testId: string }) {
  return (
    <div className="relative overflow-x-auto">
      <table className="w-full text-left text-sm" data-testid={testId}>
        <caption className="mb-1 text-left font-semibold">{caption}</caption>
        <thead className="border-b border-slate-300 bg-alarm-100">
          <tr>
            <th scope="col" className="px-3 py-2">
              Row
            </th>
            <th scope="col" className="px-3 py-2">
              Field
            </th>
            <th scope="col" className="px-3 py-2">
              What is wrong
            </th>
          </tr>
        </thead>
        <tbody className="divide-y divide-slate-200">
          {problems.map((problem, index) => (
            <tr key={`${problem.row}-${problem.field}-${index}`}>
              <td className="px-3 py-2">{problem.row}</td>
              <td className="px-3 py-2">{fieldLabels[problem.field]}</td>
              <td className="px-3 py-2">{problem.message}</td>
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}

/**
 * Choose a CSV, see what it holds (checked in the browser with the same rules as the server), then send
 * the invitations; the server checks again, also against existing members and open invitations.
 */
export function RosterImportForm() {
  // A file chosen before the page's scripts run would be lost: the input waits for them.
  const hydrated = useHydrated();
  const router = useRouter();
  const input = useRef<HTMLInputElement>(null);
  const [file, setFile] = useState<File | null>(null);
  const [fileError, setFileError] = useState<string | undefined>();
  const [preview, setPreview] = useState<RosterCheck | null>(null);
  const [report, setReport] = useState<RosterImportReport | null>(null);
  const [outcome, setOutcome] = useState<{ ok: boolean; message: string } | null>(null);
  const [sending, setSending] = useState(false);

  async function choose(chosen: File | undefined) {
    setReport(null);
    setOutcome(null);
    setPreview(null);
    setFile(null);
    setFileError(undefined);
    if (!chosen) return;
    const problem = rosterFileProblem(chosen);
    if (problem) {
      setFileError(problem);
      return;
    }
    const check = checkRoster(await chosen.text());
    if (check.fileProblem) {
      setFileError(check.fileProblem);
      return;
    }
    setFile(chosen);
    setPreview(check);
  }

  async function send() {
    if (!file) return;
    setSending(true);
    const data = new FormData();
    data.set("roster", file);
    const result = await reachAction(() => importRosterAction(data));
    setSending(false);
    setOutcome(result.ok ? { ok: true, message: result.message ?? "Done." } : { ok: false, message: result.message });
    // A refusal with a report (no row could be invited) is shown like an import; any other keeps the file to try again.
    if (!result.ok && !result.data) return;
    setReport(result.data ?? null);
    setPreview(null);
    setFile(null);
    if (input.current) input.current.value = "";
    router.refresh();
  }

  return (
    <div className="space-y-4" data-testid="roster-import" data-ready={hydrated ? "true" : "false"}>
      <TextField
        ref={input}
        label="Roster file (CSV)"
        type="file"
        accept=".csv,.txt,text/csv,text/plain"
        disabled={!hydrated}
        hint={`Columns: name, email and optionally role (athlete, coach or admin; blank means athlete). Up to ${rosterLimits.maxRows} rows and ${rosterLimits.maxBytes / 1024} KB.`}
        error={fileError}
        onChange={(event) => void choose(event.target.files?.[0])}
      />

      {preview && (
        <section aria-labelledby="roster-preview-heading" className="space-y-3" data-testid="roster-preview">
          <h3 id="roster-preview-heading" className="font-semibold">
            Before sending
          </h3>
          <p>
            {preview.rowCount} {preview.rowCount === 1 ? "row" : "rows"} read: {preview.entries.length} ready to invite,{" "}
            {new Set(preview.problems.map((problem) => problem.row)).size} with problems.
          </p>
          {preview.entries.length > 0 && (
            <div className="relative overflow-x-auto">
              <table className="w-full text-left text-sm" data-testid="roster-ready">
                <caption className="mb-1 text-left font-semibold">Ready to invite</caption>
                <thead className="border-b border-slate-300 bg-river-50">
                  <tr>
                    <th scope="col" className="px-3 py-2">
                      Row
                    </th>
                    <th scope="col" className="px-3 py-2">
                      Name
                    </th>
                    <th scope="col" className="px-3 py-2">
                      E-mail
                    </th>
                    <th scope="col" className="px-3 py-2">
                      Role
                    </th>
                  </tr>
                </thead>
                <tbody className="divide-y divide-slate-200">
                  {preview.entries.map((entry) => (
                    <tr key={entry.row}>
                      <td className="px-3 py-2">{entry.row}</td>
                      <td className="px-3 py-2">{entry.name}</td>
                      <td className="px-3 py-2 break-all">{entry.email}</td>
                      <td className="px-3 py-2">{roleLabels[entry.role]}</td>
                    </tr>
                  ))}
                </tbody>
              </table>
            </div>
          )}
          {preview.problems.length > 0 && (
            <ProblemTable problems={preview.problems} caption="Will not be imported" testId="roster-preview-problems" />
          )}
          <p className="text-sm text-slate-700">Addresses that already have an account or an open invitation are checked when you send.</p>
          <Button
            type="button"
            onClick={() => void send()}
            pending={sending}
            pendingLabel="Sending invitations…"
            disabled={preview.entries.length === 0}
          >
            Send {preview.entries.length} {preview.entries.length === 1 ? "invitation" : "invitations"}
          </Button>
        </section>
      )}

      <LiveStatus testId="roster-status">
        {outcome && <Notice tone={outcome.ok ? "success" : "error"} title={outcome.message} />}
      </LiveStatus>

      {report && (
        <section aria-labelledby="roster-report-heading" className="space-y-3" data-testid="roster-report">
          <h3 id="roster-report-heading" className="font-semibold">
            Import report
          </h3>
          {report.invited.length > 0 && (
            <p>Invited: {report.invited.map((entry) => `${entry.name} (row ${entry.row})`).join(", ")}. Each gets the invitation e-mail.</p>
          )}
          {report.unsent.length > 0 && (
            <Notice tone="warning" title="Some e-mails could not be sent">
              Invitations exist for {report.unsent.join(", ")}, but their e-mail failed. Invite them again from the form on the club page.
            </Notice>
          )}
          {report.problems.length > 0 ? (
            <ProblemTable problems={report.problems} caption="Rows not imported" testId="roster-report-problems" />
          ) : (
            <p>Every row was imported.</p>
          )}
        </section>
      )}
    </div>
  );
}
