import { useMe } from "../../api/auth";
import { Alert } from "../../components/Alert";
import { ResendVerificationButton } from "./ResendVerificationButton";

/**
 * For a signed-in user who signed up with an invited address and has not yet followed the mailed
 * link: the projects they were invited to stay closed until they do. Shows nothing otherwise.
 */
export function VerifyEmailBanner() {
  const me = useMe();
  if (me.data?.emailVerified !== false) return null;
  return (
    <div className="mb-6">
      <Alert tone="caution" title="Check your e-mail to join the projects you were invited to">
        <p>{`We sent a link to ${me.data.email}. Until you follow it, those projects stay closed to this account.`}</p>
        <div className="mt-2">
          <ResendVerificationButton />
        </div>
      </Alert>
    </div>
  );
}
