import type { Metadata } from "next";
import { JoinForm } from "./join-form";

export const metadata: Metadata = { title: "Join" };

export default function JoinPage() {
  return <JoinForm />;
}
