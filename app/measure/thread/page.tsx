import type { Metadata } from "next";
import { Cautions } from "@/components/safety/cautions";
import { ThreadCalculator } from "@/components/measure/thread-calculator";

export const metadata: Metadata = { title: "Identify a thread" };

export default function MeasureThreadPage() {
  return (
    <div className="space-y-8">
      <ThreadCalculator />
      <Cautions kinds={["grease"]} />
    </div>
  );
}
