import { useEffect, useState, type FormEvent } from "react";
import { Link, Navigate, useNavigate, useSearchParams } from "react-router";
import { useMe, useSignIn } from "../../api/auth";
import { isApiError, type FieldErrors } from "../../api/client";
import { loadSchemas } from "../../api/schemas";
import { Alert } from "../../components/Alert";
import { AuthLayout } from "../../components/AuthLayout";
import { Button } from "../../components/Button";
import { TextField } from "../../components/TextField";
import { formLevelMessage, mergeFieldErrors, validateForm } from "../../forms/validateForm";
import { formValues } from "../../forms/formValues";
import { safeNextPath } from "../../forms/safeNextPath";

const fields = ["email", "password"] as const;

export function SignInForm({ onSignedIn }: { onSignedIn: () => void }) {
  const signIn = useSignIn();
  const [clientErrors, setClientErrors] = useState<FieldErrors>({});

  // The form's schema comes with the contracts' chunk, not with this page: loaded once the form is
  // on screen, so the page paints without zod and the check is ready by the time the user submits.
  useEffect(() => void loadSchemas(), []);

  async function handleSubmit(event: FormEvent<HTMLFormElement>) {
    event.preventDefault();
    const values = formValues(event.currentTarget);
    const { signInRequestSchema } = await loadSchemas();
    const result = validateForm(signInRequestSchema, values);
    if (!result.ok) {
      setClientErrors(result.errors);
      signIn.reset();
      return;
    }
    setClientErrors({});
    signIn.mutate(result.data, { onSuccess: onSignedIn });
  }

  const errors = mergeFieldErrors(clientErrors, signIn.error);
  const message = formLevelMessage(signIn.error, fields);
  const wrongCredentials = isApiError(signIn.error) && signIn.error.code === "invalid-credentials";

  return (
    <form noValidate onSubmit={(event) => void handleSubmit(event)} className="space-y-4">
      {message !== null && (
        <Alert tone="error" title={wrongCredentials ? "Sign-in failed" : "Could not sign in"}>
          {wrongCredentials ? "That e-mail and password do not match an account." : message}
        </Alert>
      )}
      <TextField label="E-mail" name="email" type="email" autoComplete="email" error={errors.email} />
      <TextField
        label="Password"
        name="password"
        type="password"
        autoComplete="current-password"
        error={errors.password}
      />
      <Button type="submit" className="w-full" busy={signIn.isPending} busyLabel="Signing in…">
        Sign in
      </Button>
    </form>
  );
}

export function SignInPage() {
  const me = useMe();
  const navigate = useNavigate();
  const [params] = useSearchParams();
  const next = safeNextPath(params.get("next"));

  if (me.data !== undefined && me.data !== null) return <Navigate to={next} replace />;

  return (
    <AuthLayout
      title="Sign in"
      footer={
        <>
          New to Spanwright?{" "}
          <Link to="/sign-up" className="font-medium text-ink-700 underline underline-offset-2 hover:text-ink-900">
            Create an account
          </Link>
        </>
      }
    >
      <SignInForm onSignedIn={() => void navigate(next, { replace: true })} />
    </AuthLayout>
  );
}

export default SignInPage;
