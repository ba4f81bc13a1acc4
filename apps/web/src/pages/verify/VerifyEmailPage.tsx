import { useEffect, useRef } from "react";
import { Link, useSearchParams } from "react-router";
import { useMe, useVerifyEmail } from "../../api/auth";
import { isApiError } from "../../api/client";
import { Alert } from "../../components/Alert";
import { AuthLayout } from "../../components/AuthLayout";
import { ResendVerificationButton } from "./ResendVerificationButton";

const linkClasses = "font-medium text-ink-700 underline underline-offset-2 hover:text-ink-900";

/** What went wrong, in words; the error codes come from `POST /api/auth/verify-email`. */
function failureMessage(error: unknown): string {
  if (isApiError(error) && error.code === "verification-token-expired") {
    return "This link has expired. Ask for a new one below, or from your projects page after signing in.";
  }
  if (isApiError(error) && error.code === "verification-token-invalid") {
    return "This link is not valid, or it was already used. Only the newest link we sent works.";
  }
  return "We could not confirm your e-mail just now. Open the link again in a moment.";
}

/**
 * The page the verification e-mail links to (`/verify-email?token=…`). It sends the token once, by
 * itself, and says what happened. It works signed out too: the link is the proof, not the session.
 */
export function VerifyEmailPage() {
  const [params] = useSearchParams();
  const token = params.get("token") ?? "";
  const verify = useVerifyEmail();
  const { mutate } = verify;
  const me = useMe();
  // The token works once: send it once, even when React runs the effect twice in development.
  const sent = useRef(false);
  useEffect(() => {
    if (sent.current || token === "") return;
    sent.current = true;
    mutate(token);
  }, [token, mutate]);

  const signedIn = me.data !== undefined && me.data !== null;
  const canResend = signedIn && me.data?.emailVerified === false;

  return (
    <AuthLayout
      title="Confirm your e-mail"
      footer={
        signedIn ? (
          <Link to="/projects" className={linkClasses}>
            Go to your projects
          </Link>
        ) : (
          <Link to="/sign-in?next=%2Fprojects" className={linkClasses}>
            Sign in
          </Link>
        )
      }
    >
      {token === "" && (
        <Alert tone="error" title="This link is incomplete">
          Open the link from the e-mail again; it ends with a long code.
        </Alert>
      )}
      {token !== "" && (verify.isIdle || verify.isPending) && <p className="text-paper-700">Confirming your e-mail…</p>}
      {verify.isSuccess && (
        <Alert tone="success" title="Your e-mail is confirmed">
          {`${verify.data.email} is yours. The projects you were invited to are open to you now.`}
        </Alert>
      )}
      {verify.isError && (
        <div className="space-y-4">
          <Alert tone="error" title="Could not confirm your e-mail">
            {failureMessage(verify.error)}
          </Alert>
          {canResend && <ResendVerificationButton />}
        </div>
      )}
    </AuthLayout>
  );
}

export default VerifyEmailPage;
