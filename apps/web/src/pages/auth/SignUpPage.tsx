import { useState, type FormEvent } from "react";
import { Link, Navigate, useNavigate } from "react-router";
import { signUpRequestSchema } from "@spanwright/contracts";
import { useMe, useSignUp } from "../../api/auth";
import { isApiError, type FieldErrors } from "../../api/client";
import { Alert } from "../../components/Alert";
import { AuthLayout } from "../../components/AuthLayout";
import { Button } from "../../components/Button";
import { TextField } from "../../components/TextField";
import { formLevelMessage, mergeFieldErrors, validateForm } from "../../forms/validateForm";
import { formValues } from "../../forms/formValues";

const fields = ["name", "email", "password"] as const;

export function SignUpForm({ onSignedUp }: { onSignedUp: () => void }) {
  const signUp = useSignUp();
  const [clientErrors, setClientErrors] = useState<FieldErrors>({});

  function handleSubmit(event: FormEvent<HTMLFormElement>) {
    event.preventDefault();
    const result = validateForm(signUpRequestSchema, formValues(event.currentTarget));
    if (!result.ok) {
      setClientErrors(result.errors);
      signUp.reset();
      return;
    }
    setClientErrors({});
    signUp.mutate(result.data, { onSuccess: onSignedUp });
  }

  // "email-taken" is about one field: show it there rather than as a banner.
  const taken = isApiError(signUp.error) && signUp.error.code === "email-taken";
  const errors: FieldErrors = {
    ...mergeFieldErrors(clientErrors, signUp.error),
    ...(taken && clientErrors.email === undefined ? { email: "An account with this e-mail already exists." } : {}),
  };
  const message = taken ? null : formLevelMessage(signUp.error, fields);

  return (
    <form noValidate onSubmit={handleSubmit} className="space-y-4">
      {message !== null && (
        <Alert tone="error" title="Could not create the account">
          {message}
        </Alert>
      )}
      <TextField label="Full name" name="name" autoComplete="name" error={errors.name} />
      <TextField label="E-mail" name="email" type="email" autoComplete="email" error={errors.email} />
      <TextField
        label="Password"
        name="password"
        type="password"
        autoComplete="new-password"
        hint="At least 10 characters. A long phrase is easier to remember than symbols."
        error={errors.password}
      />
      <Button type="submit" className="w-full" busy={signUp.isPending} busyLabel="Creating account…">
        Create account
      </Button>
    </form>
  );
}

export function SignUpPage() {
  const me = useMe();
  const navigate = useNavigate();
  if (me.data !== undefined && me.data !== null) return <Navigate to="/projects" replace />;
  return (
    <AuthLayout
      title="Create your account"
      footer={
        <>
          Already have an account?{" "}
          <Link to="/sign-in" className="font-medium text-ink-700 underline underline-offset-2 hover:text-ink-900">
            Sign in
          </Link>
        </>
      }
    >
      <SignUpForm onSignedUp={() => void navigate("/projects", { replace: true })} />
    </AuthLayout>
  );
}

export default SignUpPage;
