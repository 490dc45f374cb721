import type { Metadata } from "next";
import { Cautions } from "@/components/safety/cautions";
import { FeltCalculator } from "@/components/measure/felt-calculator";

export const metadata: Metadata = { title: "Measure a felt seal" };

export default function MeasureFeltPage() {
  return (
    <div className="space-y-8">
      <FeltCalculator />
      <Cautions kinds={["seals"]} />
    </div>
  );
}
