import type { Metadata } from "next";
import { redirect } from "next/navigation";
import { getCaller, getSessionUser } from "@/db/access";
import { NoShop } from "./no-shop";

export const metadata: Metadata = { title: "No shop yet" };

export default async function NoShopPage() {
  if (!(await getSessionUser())) redirect("/sign-in");
  if (await getCaller()) redirect("/home");
  return <NoShop />;
}
