import { isApiError } from "../../api/client";
import { useResendVerification } from "../../api/auth";
import { Button } from "../../components/Button";

/** "Send the link again", with what came of it beside the button. */
export function ResendVerificationButton() {
  const resend = useResendVerification();
  const limited = isApiError(resend.error) && resend.error.code === "rate-limited";
  return (
    <div className="flex flex-wrap items-center gap-3">
      <Button variant="secondary" size="sm" busy={resend.isPending} busyLabel="Sending…" onClick={() => resend.mutate()}>
        Send the link again
      </Button>
      <span role="status" className="text-sm text-paper-700">
        {resend.isSuccess && "Sent. Use the newest link: earlier ones no longer work."}
        {resend.isError && (limited ? "Too many requests; wait a few minutes and try again." : "Could not send the link; try again later.")}
      </span>
    </div>
  );
}
