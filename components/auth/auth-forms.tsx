"use client";

import Link from "next/link";
import { useActionState } from "react";
import { acceptInviteAction, requestResetAction, resetPasswordAction, signInAction, type FormState } from "@/app/(auth)/actions";
import { Button } from "@/components/ui/button";
import { Notice } from "@/components/ui/card";
import { describedBy, Field, Input } from "@/components/ui/field";

const first = (s: FormState, k: string) => s.fields?.[k]?.[0];

export function SignInForm({ next, notice }: { next?: string; notice?: string }) {
  const [state, action, pending] = useActionState(signInAction, {});
  return (
    <form action={action} className="space-y-4" noValidate>
      <h1 className="text-xl font-semibold">Sign in</h1>
      {notice && <Notice tone="success">{notice}</Notice>}
      {state.message && <Notice tone="error">{state.message}</Notice>}
      <input type="hidden" name="next" value={next ?? ""} />
      <Field id="email" label="Email" error={first(state, "email")}>
        <Input {...describedBy("email", first(state, "email"))} name="email" type="email" autoComplete="email" required autoFocus />
      </Field>
      <Field id="password" label="Password" error={first(state, "password")}>
        <Input {...describedBy("password", first(state, "password"))} name="password" type="password" autoComplete="current-password" required />
      </Field>
      <Button type="submit" className="w-full" disabled={pending}>
        {pending ? "Signing in…" : "Sign in"}
      </Button>
      <p className="text-center text-sm">
        <Link href="/forgot-password" className="text-kiln-600 underline-offset-2 hover:underline">
          Forgot your password?
        </Link>
      </p>
    </form>
  );
}

export function ForgotPasswordForm() {
  const [state, action, pending] = useActionState(requestResetAction, {});
  return (
    <form action={action} className="space-y-4" noValidate>
      <h1 className="text-xl font-semibold">Reset your password</h1>
      <p className="text-sm text-ink-soft">Enter the address you sign in with. We will e-mail you a link to choose a new password.</p>
      {state.message && <Notice tone={state.done ? "success" : "error"}>{state.message}</Notice>}
      <Field id="email" label="Email" error={first(state, "email")}>
        <Input {...describedBy("email", first(state, "email"))} name="email" type="email" autoComplete="email" required autoFocus />
      </Field>
      <Button type="submit" className="w-full" disabled={pending}>
        {pending ? "Sending…" : "Send the link"}
      </Button>
      <p className="text-center text-sm">
        <Link href="/sign-in" className="text-kiln-600 hover:underline">
          Back to sign in
        </Link>
      </p>
    </form>
  );
}

export function SetPasswordForm({ token, purpose, email }: { token: string; purpose: "reset" | "invite"; email: string }) {
  const [state, action, pending] = useActionState(purpose === "invite" ? acceptInviteAction : resetPasswordAction, {});
  return (
    <form action={action} className="space-y-4" noValidate>
      <h1 className="text-xl font-semibold">{purpose === "invite" ? "Welcome — set your password" : "Choose a new password"}</h1>
      <p className="text-sm text-ink-soft">
        For <span className="font-medium text-ink">{email}</span>. Use at least 10 characters.
      </p>
      {state.message && <Notice tone="error">{state.message}</Notice>}
      <input type="hidden" name="token" value={token} />
      <Field id="password" label="New password" error={first(state, "password")}>
        <Input {...describedBy("password", first(state, "password"))} name="password" type="password" autoComplete="new-password" required minLength={10} autoFocus />
      </Field>
      <Field id="confirm" label="Repeat the password" error={first(state, "confirm")}>
        <Input {...describedBy("confirm", first(state, "confirm"))} name="confirm" type="password" autoComplete="new-password" required />
      </Field>
      <Button type="submit" className="w-full" disabled={pending}>
        {pending ? "Saving…" : purpose === "invite" ? "Set password and continue" : "Save and sign in"}
      </Button>
    </form>
  );
}
