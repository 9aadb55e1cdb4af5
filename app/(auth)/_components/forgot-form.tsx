"use client";

import { zodResolver } from "@hookform/resolvers/zod";
import Link from "next/link";
import { useState } from "react";
import { useForm } from "react-hook-form";
import { callApi } from "../../_ui/api-client";
import { Field, FormNotice } from "../../_ui/field";
import { forgotSchema, type ForgotValues } from "./schemas";

export function ForgotForm() {
  const [notice, setNotice] = useState<{ tone: "error" | "ok"; text: string } | null>(null);
  const form = useForm<ForgotValues>({ resolver: zodResolver(forgotSchema), mode: "onChange", defaultValues: { email: "" } });
  const { errors, isSubmitting } = form.formState;

  async function onSubmit(values: ForgotValues) {
    const result = await callApi("/api/auth/request-password-reset", { body: { email: values.email, redirectTo: "/reset-password" } });
    setNotice(
      result.ok
        ? { tone: "ok", text: "If an account uses this address, a link to choose a new password is on its way. It works for one hour." }
        : { tone: "error", text: result.error.message },
    );
  }

  return (
    <form onSubmit={form.handleSubmit(onSubmit)} noValidate className="flex flex-col gap-4" aria-label="Reset the password">
      <h1 className="text-2xl font-semibold">Forgot the password?</h1>
      <p className="text-sm text-ink-2">We mail you a link to choose a new one.</p>
      {notice ? <FormNotice tone={notice.tone}>{notice.text}</FormNotice> : null}
      <Field label="E-mail" type="email" autoComplete="email" error={errors.email?.message} {...form.register("email")} />
      <button type="submit" className="btn" disabled={isSubmitting}>
        {isSubmitting ? "Sending…" : "Send the link"}
      </button>
      <Link href="/sign-in" className="text-sm">
        Back to sign-in
      </Link>
    </form>
  );
}
