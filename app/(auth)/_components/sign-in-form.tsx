"use client";

import { useGo } from "../../_ui/use-go";
import { zodResolver } from "@hookform/resolvers/zod";
import Link from "next/link";
import { useState } from "react";
import { useForm } from "react-hook-form";
import { callApi } from "../../_ui/api-client";
import { Field, FormNotice } from "../../_ui/field";
import { safeNext, signInSchema, type SignInValues } from "./schemas";

export function SignInForm({ next, email, notice: initialNotice }: { next?: string; email?: string; notice?: string }) {
  const go = useGo();
  const [notice, setNotice] = useState<{ tone: "error" | "ok"; text: string } | null>(initialNotice ? { tone: "ok", text: initialNotice } : null);
  const form = useForm<SignInValues>({ resolver: zodResolver(signInSchema), mode: "onChange", defaultValues: { email: email ?? "", password: "" } });
  const { errors, isSubmitting } = form.formState;

  async function onSubmit(values: SignInValues) {
    setNotice(null);
    const result = await callApi("/api/auth/sign-in/email", { body: values });
    if (!result.ok) {
      if (result.error.fields?.password) form.setError("password", { message: result.error.fields.password });
      else setNotice({ tone: "error", text: result.error.message });
      return;
    }
    go(safeNext(next));
  }

  return (
    <form onSubmit={form.handleSubmit(onSubmit)} noValidate className="flex flex-col gap-4" aria-label="Sign in">
      <h1 className="text-2xl font-semibold">Sign in</h1>
      {notice ? <FormNotice tone={notice.tone}>{notice.text}</FormNotice> : null}
      <Field label="E-mail" type="email" autoComplete="email" error={errors.email?.message} {...form.register("email")} />
      <Field label="Password" type="password" autoComplete="current-password" error={errors.password?.message} {...form.register("password")} />
      <button type="submit" className="btn" disabled={isSubmitting}>
        {isSubmitting ? "Signing in…" : "Sign in"}
      </button>
      <div className="flex justify-between text-sm text-ink-2">
        <Link href="/forgot-password">Forgot the password?</Link>
        <Link href={`/sign-up${next ? `?next=${encodeURIComponent(next)}` : ""}`}>Create an account</Link>
      </div>
    </form>
  );
}
