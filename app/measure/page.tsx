import { redirect } from "next/navigation";

export default function MeasurePage() {
  redirect("/measure/bearing");
}
