import type { Member, Role } from "@spanwright/contracts";
import { useChangeMemberRole, useRemoveMember } from "../../api/members";
import { Alert } from "../../components/Alert";
import { ConfirmButton } from "../../components/ConfirmButton";
import { SelectField } from "../../components/SelectField";
import { formatDate } from "../../formatDate";
import { roleLabels, roleOptions } from "../../roleLabels";
import { describeMemberError } from "./memberErrors";
import { TableHead } from "../../components/TableHead";

export function MembersTable({
  projectId,
  members,
  currentUserId,
  canManage,
}: {
  projectId: string;
  members: readonly Member[];
  currentUserId: string;
  canManage: boolean;
}) {
  const changeRole = useChangeMemberRole(projectId);
  const remove = useRemoveMember(projectId);
  const failure = changeRole.error ?? remove.error;

  return (
    <>
      {failure !== null && (
        <div className="mb-3">
          <Alert tone="error" title={changeRole.isError ? "Role not changed" : "Member not removed"}>
            {describeMemberError(failure)}
          </Alert>
        </div>
      )}
      <table className="w-full text-left text-sm">
        <TableHead columns={["Name", "E-mail", "Role", "Added", canManage && { label: "Actions", hidden: true }]} />
        <tbody>
          {members.map((m) => {
            const isMe = m.userId === currentUserId;
            return (
              <tr key={m.userId} className="border-b border-paper-100 align-middle last:border-0">
                <td className="py-2.5 pr-3 font-medium text-ink-900">
                  {m.pending ? <span className="text-paper-600">Invited</span> : m.name}
                  {isMe && <span className="ml-1 text-xs font-normal text-paper-600">(you)</span>}
                </td>
                <td className="py-2.5 pr-3 text-paper-700">{m.email}</td>
                <td className="py-2.5 pr-3">
                  {canManage ? (
                    <SelectField
                      label={`Role of ${m.pending ? m.email : m.name}`}
                      labelHidden
                      name="role"
                      className="w-44"
                      options={roleOptions}
                      value={m.role}
                      disabled={changeRole.isPending && changeRole.variables?.userId === m.userId}
                      onChange={(e) => {
                        remove.reset();
                        changeRole.mutate({ userId: m.userId, role: e.target.value as Role });
                      }}
                    />
                  ) : (
                    roleLabels[m.role]
                  )}
                </td>
                <td className="tabular py-2.5 pr-3 text-paper-700">{formatDate(m.addedAt)}</td>
                {canManage && (
                  <td className="py-2.5 text-right">
                    <ConfirmButton
                      label={isMe ? "Leave" : "Remove"}
                      confirmLabel={isMe ? "Leave project" : "Remove"}
                      question={isMe ? "Leave this project?" : `Remove ${m.pending ? m.email : m.name}?`}
                      busy={remove.isPending && remove.variables === m.userId}
                      onConfirm={() => {
                        changeRole.reset();
                        remove.mutate(m.userId);
                      }}
                    />
                  </td>
                )}
              </tr>
            );
          })}
        </tbody>
      </table>
    </>
  );
}
