import type { Metadata } from "next";
import { ForgotForm } from "../_components/forgot-form";

export const metadata: Metadata = { title: "Forgot the password" };

export default function ForgotPasswordPage() {
  return <ForgotForm />;
}
