"use client";

import { useGo } from "../../_ui/use-go";
import { zodResolver } from "@hookform/resolvers/zod";
import Link from "next/link";
import { useState } from "react";
import { useForm } from "react-hook-form";
import { callApi } from "../../_ui/api-client";
import { Field, FormNotice } from "../../_ui/field";
import { MIN_PASSWORD, safeNext, signUpSchema, type SignUpValues } from "./schemas";

export function SignUpForm({ next, email }: { next?: string; email?: string }) {
  const go = useGo();
  const [notice, setNotice] = useState<string | null>(null);
  const form = useForm<SignUpValues>({
    resolver: zodResolver(signUpSchema),
    mode: "onChange",
    defaultValues: { name: "", email: email ?? "", password: "" },
  });
  const { errors, isSubmitting } = form.formState;

  async function onSubmit(values: SignUpValues) {
    setNotice(null);
    const result = await callApi("/api/auth/sign-up/email", {
      // Coming from an invitation, the confirmation link leads back to it (only a confirmed address may accept).
      body: { ...values, callbackURL: next?.startsWith("/invite/") ? safeNext(next) : "/home?verified=1" },
    });
    if (!result.ok) {
      for (const [field, message] of Object.entries(result.error.fields ?? {})) {
        if (field === "name" || field === "email" || field === "password") form.setError(field, { message });
      }
      if (!result.error.fields) setNotice(result.error.message);
      return;
    }
    go(safeNext(next));
  }

  return (
    <form onSubmit={form.handleSubmit(onSubmit)} noValidate className="flex flex-col gap-4" aria-label="Create an account">
      <h1 className="text-2xl font-semibold">Create your account</h1>
      <p className="text-sm text-ink-2">
        {next?.startsWith("/invite/") ? "Create an account to accept your invitation." : "You get a workshop of your own, with you as its owner. You can invite your team later."}
      </p>
      {notice ? <FormNotice tone="error">{notice}</FormNotice> : null}
      <Field label="Your name" autoComplete="name" error={errors.name?.message} {...form.register("name")} />
      <Field label="E-mail" type="email" autoComplete="email" error={errors.email?.message} {...form.register("email")} />
      <Field
        label="Password"
        type="password"
        autoComplete="new-password"
        hint={`At least ${MIN_PASSWORD} characters.`}
        error={errors.password?.message}
        {...form.register("password")}
      />
      <button type="submit" className="btn" disabled={isSubmitting}>
        {isSubmitting ? "Creating…" : "Create account"}
      </button>
      <p className="text-sm text-ink-2">
        Already have an account? <Link href={`/sign-in${next ? `?next=${encodeURIComponent(next)}` : ""}`}>Sign in</Link>
      </p>
    </form>
  );
}
