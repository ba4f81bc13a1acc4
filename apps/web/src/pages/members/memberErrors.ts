import { describeError, isApiError } from "../../api/client";

/** Words for the member-management refusals a project lead can run into. */
export function describeMemberError(error: unknown): string {
  if (isApiError(error)) {
    switch (error.code) {
      case "last-owner":
        return "A project needs at least one project lead. Make someone else a project lead first.";
      case "already-member":
        return "That person is already a member of this project.";
      case "forbidden":
        return "Only a project lead can manage members.";
      default:
        return error.message;
    }
  }
  return describeError(error);
}
