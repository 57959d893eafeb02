"use client";

import Link from "next/link";
import { useState } from "react";
import { useRouter } from "next/navigation";
import {
  createColumnHelper,
  flexRender,
  getCoreRowModel,
  getFilteredRowModel,
  getSortedRowModel,
  useReactTable,
  type FilterFn,
  type SortingState,
} from "@tanstack/react-table";
import type { MemberSummary } from "@/lib/data/members";
import { roleLabels, roles, type Role } from "@/lib/auth/roles";
import { Button } from "@/components/ui/button";
import { Dialog } from "@/components/ui/dialog";
import { SelectField, TextField } from "@/components/ui/field";
import { LiveStatus, Notice } from "@/components/ui/notice";
import { changeMemberEmailAction, changeMemberRoleAction, renameMemberAction, setMemberStatusAction } from "../actions";
import type { ActionResult } from "@/lib/http/action-result";
import { reachAction } from "@/lib/http/reach-action";

export interface MemberRow extends MemberSummary {
  /** Formatted on the server so that server and browser render the same text. */
  lastSignInLabel: string;
}

type Pending = { kind: "role" | "rename" | "email" | "deactivate"; member: MemberRow } | null;

const column = createColumnHelper<MemberRow>();

const matchesSearch: FilterFn<MemberRow> = (row, _columnId, value: string) => {
  const needle = value.trim().toLowerCase();
  if (!needle) return true;
  const member = row.original;
  return [member.name, member.email, roleLabels[member.role], member.role, member.status].some((text) =>
    text.toLowerCase().includes(needle),
  );
};

function StatusWord({ status }: { status: MemberRow["status"] }) {
  return status === "active" ? (
    <span className="inline-flex items-center gap-1 font-semibold text-reed-800">
      <span aria-hidden="true">●</span> Active
    </span>
  ) : (
    <span className="inline-flex items-center gap-1 font-semibold text-alarm-800">
      <span aria-hidden="true">⊘</span> Deactivated
    </span>
  );
}

/** What the role and status cells need from the component, passed through TanStack's table meta. */
interface ChangesMeta {
  actorId: number;
  busy: boolean;
  askRole: (member: MemberRow) => void;
  askRename: (member: MemberRow) => void;
  askEmail: (member: MemberRow) => void;
  askDeactivate: (member: MemberRow) => void;
  reactivate: (member: MemberRow) => void;
}

function RoleCell({ member, meta }: { member: MemberRow; meta: ChangesMeta }) {
  return (
    <div className="flex flex-col items-start gap-1">
      <span>{roleLabels[member.role]}</span>
      {member.id !== meta.actorId && (
        <Button variant="secondary" onClick={() => meta.askRole(member)} className="whitespace-nowrap">
          Change role<span className="sr-only"> of {member.name}</span>
        </Button>
      )}
    </div>
  );
}

function StatusCell({ member, meta }: { member: MemberRow; meta: ChangesMeta }) {
  return (
    <div className="flex flex-col items-start gap-1">
      <StatusWord status={member.status} />
      {member.id === meta.actorId ? (
        <span className="text-sm text-slate-700">Your own account</span>
      ) : member.status === "active" ? (
        <Button variant="secondary" onClick={() => meta.askDeactivate(member)}>
          Deactivate<span className="sr-only"> {member.name}</span>
        </Button>
      ) : (
        <Button variant="secondary" disabled={meta.busy} onClick={() => meta.reactivate(member)}>
          Reactivate<span className="sr-only"> {member.name}</span>
        </Button>
      )}
    </div>
  );
}

function NameCell({ member, meta }: { member: MemberRow; meta: ChangesMeta }) {
  return (
    <div className="flex flex-col items-start gap-1">
      <span className="font-semibold">{member.name}</span>
      {member.id !== meta.actorId && (
        <Button variant="secondary" onClick={() => meta.askRename(member)} className="whitespace-nowrap">
          Correct name<span className="sr-only"> of {member.name}</span>
        </Button>
      )}
    </div>
  );
}

function EmailCell({ member, meta }: { member: MemberRow; meta: ChangesMeta }) {
  return (
    <div className="flex flex-col items-start gap-1">
      <span className="[overflow-wrap:anywhere]">{member.email}</span>
      {member.id !== meta.actorId && member.status === "active" && (
        <Button variant="secondary" onClick={() => meta.askEmail(member)} className="whitespace-nowrap">
          Change e-mail<span className="sr-only"> of {member.name}</span>
        </Button>
      )}
    </div>
  );
}

const columns = [
  column.accessor("name", {
    header: "Name",
    cell: (info) => <NameCell member={info.row.original} meta={info.table.options.meta as ChangesMeta} />,
  }),
  column.accessor("email", {
    header: "E-mail",
    cell: (info) => <EmailCell member={info.row.original} meta={info.table.options.meta as ChangesMeta} />,
  }),
  column.accessor((member) => roleLabels[member.role], {
    id: "role",
    header: "Role",
    cell: (info) => <RoleCell member={info.row.original} meta={info.table.options.meta as ChangesMeta} />,
  }),
  column.accessor("status", {
    header: "Status",
    cell: (info) => <StatusCell member={info.row.original} meta={info.table.options.meta as ChangesMeta} />,
  }),
  column.accessor("lastSignInAt", {
    header: "Last sign-in",
    // ISO timestamps sort as text; "never signed in" comes first when ascending.
    sortingFn: (a, b) => (a.original.lastSignInAt ?? "").localeCompare(b.original.lastSignInAt ?? ""),
    cell: (info) => info.row.original.lastSignInLabel,
  }),
];

/** The club's members: searchable, sortable, with role changes and deactivation for admins. */
export function MembersTable({ members, actorId }: { members: MemberRow[]; actorId: number }) {
  const router = useRouter();
  const [search, setSearch] = useState("");
  const [sorting, setSorting] = useState<SortingState>([{ id: "name", desc: false }]);
  const [pending, setPending] = useState<Pending>(null);
  const [newRole, setNewRole] = useState<Role>("athlete");
  const [newName, setNewName] = useState("");
  const [nameError, setNameError] = useState<string | undefined>(undefined);
  const [newEmail, setNewEmail] = useState("");
  const [emailError, setEmailError] = useState<string | undefined>(undefined);
  const [busy, setBusy] = useState(false);
  const [outcome, setOutcome] = useState<{ ok: boolean; message?: string; link?: { href: string; label: string } } | null>(null);

  async function run(action: () => Promise<{ ok: boolean; message?: string }>) {
    setBusy(true);
    const result = await reachAction(action);
    setBusy(false);
    setPending(null);
    setOutcome(result);
    if (result.ok) router.refresh();
  }

  /** A one-field dialog (name, e-mail) stays open on a refused value, with the reason beside the field; null then. */
  async function submitField<T>(field: string, action: () => Promise<ActionResult<T>>, showError: (message?: string) => void) {
    setBusy(true);
    showError(undefined);
    const result = await reachAction(action);
    setBusy(false);
    const fieldError = result.ok ? undefined : result.fieldErrors[field]?.[0];
    if (fieldError) {
      showError(fieldError);
      return null;
    }
    setPending(null);
    return result;
  }

  async function rename(member: MemberRow) {
    const result = await submitField("name", () => renameMemberAction({ memberId: member.id, name: newName }), setNameError);
    if (!result) return;
    const reissueHref = result.ok ? result.data?.reissueHref : null;
    const renamed = result.ok ? (result.data?.name ?? member.name) : member.name;
    setOutcome(reissueHref ? { ...result, link: { href: reissueHref, label: `Reissue ${renamed}'s certificates` } } : result);
    if (result.ok) router.refresh();
  }

  async function changeEmail(member: MemberRow) {
    const result = await submitField("newEmail", () => changeMemberEmailAction({ memberId: member.id, newEmail }), setEmailError);
    if (result) setOutcome(result);
  }

  // TanStack Table keeps its own state outside React's memoisation; this component is not compiled.
  // eslint-disable-next-line react-hooks/incompatible-library
  const table = useReactTable({
    data: members,
    columns,
    state: { globalFilter: search, sorting },
    onGlobalFilterChange: setSearch,
    onSortingChange: setSorting,
    globalFilterFn: matchesSearch,
    meta: {
      actorId,
      busy,
      askRole: (member) => {
        setNewRole(member.role);
        setOutcome(null);
        setPending({ kind: "role", member });
      },
      askRename: (member) => {
        setNewName(member.name);
        setNameError(undefined);
        setOutcome(null);
        setPending({ kind: "rename", member });
      },
      askEmail: (member) => {
        setNewEmail("");
        setEmailError(undefined);
        setOutcome(null);
        setPending({ kind: "email", member });
      },
      askDeactivate: (member) => {
        setOutcome(null);
        setPending({ kind: "deactivate", member });
      },
      reactivate: (member) => void run(() => setMemberStatusAction({ memberId: member.id, status: "active" })),
    } satisfies ChangesMeta,
    getCoreRowModel: getCoreRowModel(),
    getFilteredRowModel: getFilteredRowModel(),
    getSortedRowModel: getSortedRowModel(),
  });
  const shown = table.getRowModel().rows.length;

  return (
    <div className="space-y-4">
      <div className="max-w-sm">
        <TextField
          label="Search members"
          hint="Name, e-mail, role or status"
          type="search"
          value={search}
          onChange={(event) => setSearch(event.target.value)}
        />
      </div>
      <p aria-live="polite" data-testid="members-count" className="text-sm text-slate-700">
        Showing {shown} of {members.length} members
      </p>
      <LiveStatus testId="members-status">
        {outcome?.message && (
          <Notice tone={outcome.ok ? "success" : "error"} title={outcome.message}>
            {outcome.link && (
              <Link href={outcome.link.href} className="underline" data-testid="members-status-link">
                {outcome.link.label}
              </Link>
            )}
          </Notice>
        )}
      </LiveStatus>
      <div className="relative overflow-x-auto rounded-lg bg-white shadow-sm">
        <table className="w-full min-w-[40rem] text-left text-sm" data-testid="members-table">
          <caption className="sr-only">Members of the club, sorted by {sorting[0]?.id ?? "name"}</caption>
          <thead className="border-b border-slate-300 bg-river-50">
            {table.getHeaderGroups().map((group) => (
              <tr key={group.id}>
                {group.headers.map((header) => {
                  const sorted = header.column.getIsSorted();
                  const label = flexRender(header.column.columnDef.header, header.getContext());
                  return (
                    <th
                      key={header.id}
                      scope="col"
                      className="px-3 py-2 font-semibold"
                      aria-sort={sorted === "asc" ? "ascending" : sorted === "desc" ? "descending" : undefined}
                    >
                      {header.column.getCanSort() ? (
                        <button
                          type="button"
                          onClick={header.column.getToggleSortingHandler()}
                          className="inline-flex min-h-11 items-center gap-1 underline-offset-2 hover:underline"
                        >
                          {label}
                          <span aria-hidden="true">{sorted === "asc" ? "▲" : sorted === "desc" ? "▼" : "↕"}</span>
                        </button>
                      ) : (
                        label
                      )}
                    </th>
                  );
                })}
              </tr>
            ))}
          </thead>
          <tbody className="divide-y divide-slate-200">
            {table.getRowModel().rows.map((row) => (
              <tr key={row.id} data-testid={`member-row-${row.original.email}`}>
                {row.getVisibleCells().map((cell) => (
                  <td key={cell.id} className="px-3 py-2 align-top">
                    {flexRender(cell.column.columnDef.cell, cell.getContext())}
                  </td>
                ))}
              </tr>
            ))}
            {shown === 0 && (
              <tr>
                <td colSpan={columns.length} className="px-3 py-6 text-center text-slate-700">
                  No member matches “{search}”.
                </td>
              </tr>
            )}
          </tbody>
        </table>
      </div>

      <Dialog
        open={pending?.kind === "role"}
        onClose={() => setPending(null)}
        title={pending ? `Change role of ${pending.member.name}` : "Change role"}
        description="The new role applies from their next sign-in: their open sessions end when you save."
        testId="role-dialog"
      >
        <form
          onSubmit={(event) => {
            event.preventDefault();
            if (pending) void run(() => changeMemberRoleAction({ memberId: pending.member.id, role: newRole }));
          }}
          className="space-y-4"
        >
          <SelectField
            label="New role"
            value={newRole}
            onChange={(event) => setNewRole(event.target.value as Role)}
            options={roles.map((role) => ({ value: role, label: roleLabels[role] }))}
          />
          <div className="flex flex-wrap justify-end gap-2">
            <Button type="button" variant="secondary" autoFocus onClick={() => setPending(null)}>
              Cancel
            </Button>
            <Button type="submit" pending={busy} pendingLabel="Saving…">
              Save role
            </Button>
          </div>
        </form>
      </Dialog>

      <Dialog
        open={pending?.kind === "rename"}
        onClose={() => setPending(null)}
        title={pending ? `Correct the name of ${pending.member.name}` : "Correct name"}
        description="As new certificates and the induction register will print it. Certificates already issued keep the name they were issued to until you reissue them from the athlete's page."
        testId="rename-dialog"
      >
        <form
          onSubmit={(event) => {
            event.preventDefault();
            if (pending) void rename(pending.member);
          }}
          noValidate
          className="space-y-4"
        >
          <TextField
            label="Name"
            autoComplete="off"
            autoFocus
            value={newName}
            error={nameError}
            onChange={(event) => setNewName(event.target.value)}
          />
          <div className="flex flex-wrap justify-end gap-2">
            <Button type="button" variant="secondary" onClick={() => setPending(null)}>
              Cancel
            </Button>
            <Button type="submit" pending={busy} pendingLabel="Saving…">
              Save name
            </Button>
          </div>
        </form>
      </Dialog>

      <Dialog
        open={pending?.kind === "email"}
        onClose={() => setPending(null)}
        title={pending ? `Change the e-mail address of ${pending.member.name}` : "Change e-mail"}
        description="Slipway sends a link to the new address. Only when the member opens it do they sign in with it (and are signed out everywhere); until then nothing changes."
        testId="email-dialog"
      >
        <form
          onSubmit={(event) => {
            event.preventDefault();
            if (pending) void changeEmail(pending.member);
          }}
          noValidate
          className="space-y-4"
        >
          <TextField
            label="New e-mail address"
            type="email"
            autoComplete="off"
            autoFocus
            value={newEmail}
            error={emailError}
            onChange={(event) => setNewEmail(event.target.value)}
          />
          <div className="flex flex-wrap justify-end gap-2">
            <Button type="button" variant="secondary" onClick={() => setPending(null)}>
              Cancel
            </Button>
            <Button type="submit" pending={busy} pendingLabel="Sending…">
              Send the link
            </Button>
          </div>
        </form>
      </Dialog>

      <Dialog
        open={pending?.kind === "deactivate"}
        onClose={() => setPending(null)}
        title={pending ? `Deactivate ${pending.member.name}?` : "Deactivate member?"}
        description="They are signed out at once and cannot sign in until an administrator reactivates them. Their lessons, quiz results and sign-offs are kept."
        testId="deactivate-dialog"
      >
        <div className="flex flex-wrap justify-end gap-2">
          <Button type="button" variant="secondary" autoFocus onClick={() => setPending(null)}>
            Keep active
          </Button>
          <Button
            type="button"
            variant="danger"
            pending={busy}
            pendingLabel="Deactivating…"
            onClick={() => {
              if (pending) void run(() => setMemberStatusAction({ memberId: pending.member.id, status: "deactivated" }));
            }}
          >
            Deactivate member
          </Button>
        </div>
      </Dialog>
    </div>
  );
}
