import type { Metadata } from "next";
import { BearingCalculator } from "@/components/measure/bearing-calculator";
import { Cautions } from "@/components/safety/cautions";

export const metadata: Metadata = { title: "Measure a ball bearing" };

export default function MeasureBearingPage() {
  return (
    <div className="space-y-8">
      <BearingCalculator />
      <Cautions kinds={["bearings"]} />
    </div>
  );
}
