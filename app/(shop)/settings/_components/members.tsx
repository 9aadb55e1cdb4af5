"use client";

import { zodResolver } from "@hookform/resolvers/zod";
import { useRouter } from "next/navigation";
import { useState } from "react";
import { useForm } from "react-hook-form";
import { z } from "zod";
import { callApi } from "../../../_ui/api-client";
import { Field, FormNotice } from "../../../_ui/field";

const inviteSchema = z.object({
  email: z.string().trim().min(1, "Enter the person's e-mail address.").email("That does not look like an e-mail address."),
  role: z.enum(["builder", "owner", "customer"]),
});
type InviteValues = z.infer<typeof inviteSchema>;

export function InviteForm({ shopId }: { shopId: string }) {
  const router = useRouter();
  const [notice, setNotice] = useState<{ tone: "ok" | "error"; text: string } | null>(null);
  const form = useForm<InviteValues>({ resolver: zodResolver(inviteSchema), mode: "onChange", defaultValues: { email: "", role: "builder" } });
  const { errors, isSubmitting } = form.formState;

  async function onSubmit(values: InviteValues) {
    const result = await callApi("/api/auth/organization/invite-member", { body: { ...values, organizationId: shopId } });
    if (!result.ok) {
      setNotice({ tone: "error", text: result.error.message });
      return;
    }
    setNotice({ tone: "ok", text: `Invitation sent to ${values.email}.` });
    form.reset({ email: "", role: values.role });
    router.refresh();
  }

  return (
    <form onSubmit={form.handleSubmit(onSubmit)} noValidate className="mt-4 flex flex-col gap-4 md:flex-row md:items-end" aria-label="Invite a member">
      <div className="flex-1">
        <Field label="E-mail" type="email" error={errors.email?.message} {...form.register("email")} />
      </div>
      <div>
        <label htmlFor="invite-role" className="field-label">
          Role
        </label>
        <select id="invite-role" className="field-input" {...form.register("role")}>
          <option value="builder">Builder</option>
          <option value="owner">Owner</option>
          <option value="customer">Customer</option>
        </select>
      </div>
      <button type="submit" className="btn" disabled={isSubmitting}>
        {isSubmitting ? "Sending…" : "Send invitation"}
      </button>
      {notice ? (
        <div className="md:basis-full">
          <FormNotice tone={notice.tone}>{notice.text}</FormNotice>
        </div>
      ) : null}
    </form>
  );
}

function useAction() {
  const router = useRouter();
  const [problem, setProblem] = useState<string | null>(null);
  const [busy, setBusy] = useState(false);
  async function run(url: string, body: unknown) {
    setBusy(true);
    const result = await callApi(url, { body });
    setBusy(false);
    if (!result.ok) setProblem(result.error.message);
    else router.refresh();
  }
  return { problem, busy, run };
}

export function InvitationRow({ id, email, role, expires }: { id: string; email: string; role: string; expires: string }) {
  const { problem, busy, run } = useAction();
  return (
    <li className="flex items-center justify-between gap-4 py-2">
      <span>
        {email} · {role} · <span className="text-ink-2">until <span className="num">{expires}</span></span>
      </span>
      <span className="flex items-center gap-2">
        {problem ? <span className="text-error">{problem}</span> : null}
        <button type="button" className="btn-quiet" disabled={busy} onClick={() => run("/api/auth/organization/cancel-invitation", { invitationId: id })}>
          Withdraw
        </button>
      </span>
    </li>
  );
}

export function MemberActions({ memberId, name }: { memberId: string; name: string }) {
  const { problem, busy, run } = useAction();
  return (
    <span className="flex items-center justify-end gap-2">
      {problem ? <span className="text-error">{problem}</span> : null}
      <button
        type="button"
        className="btn-quiet"
        disabled={busy}
        onClick={() => {
          if (window.confirm(`Remove ${name} from the shop?`)) run("/api/auth/organization/remove-member", { memberIdOrEmail: memberId });
        }}
      >
        Remove
      </button>
    </span>
  );
}
