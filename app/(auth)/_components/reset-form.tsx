"use client";

import { useGo } from "../../_ui/use-go";
import { zodResolver } from "@hookform/resolvers/zod";
import Link from "next/link";
import { useState } from "react";
import { useForm } from "react-hook-form";
import { callApi } from "../../_ui/api-client";
import { Field, FormNotice } from "../../_ui/field";
import { MIN_PASSWORD, resetSchema, type ResetValues } from "./schemas";

export function ResetForm({ token }: { token: string }) {
  const go = useGo();
  const [notice, setNotice] = useState<string | null>(null);
  const form = useForm<ResetValues>({ resolver: zodResolver(resetSchema), mode: "onChange", defaultValues: { password: "", confirm: "" } });
  const { errors, isSubmitting } = form.formState;

  async function onSubmit(values: ResetValues) {
    const result = await callApi("/api/auth/reset-password", { body: { newPassword: values.password, token } });
    if (!result.ok) {
      setNotice(result.error.code === "invalid_token" ? "This link has expired or was already used. Ask for a new one." : result.error.message);
      return;
    }
    go("/sign-in?reset=1");
  }

  return (
    <form onSubmit={form.handleSubmit(onSubmit)} noValidate className="flex flex-col gap-4" aria-label="Choose a new password">
      <h1 className="text-2xl font-semibold">Choose a new password</h1>
      {notice ? (
        <FormNotice tone="error">
          {notice} <Link href="/forgot-password">Send a new link</Link>
        </FormNotice>
      ) : null}
      <Field label="New password" type="password" autoComplete="new-password" hint={`At least ${MIN_PASSWORD} characters.`} error={errors.password?.message} {...form.register("password")} />
      <Field label="The same again" type="password" autoComplete="new-password" error={errors.confirm?.message} {...form.register("confirm")} />
      <button type="submit" className="btn" disabled={isSubmitting}>
        {isSubmitting ? "Saving…" : "Save the new password"}
      </button>
    </form>
  );
}
