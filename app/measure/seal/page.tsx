import type { Metadata } from "next";
import { Cautions } from "@/components/safety/cautions";
import { SealCalculator } from "@/components/measure/seal-calculator";

export const metadata: Metadata = { title: "Measure a lip seal" };

export default function MeasureSealPage() {
  return (
    <div className="space-y-8">
      <SealCalculator />
      <Cautions kinds={["seals", "coolant"]} />
    </div>
  );
}
