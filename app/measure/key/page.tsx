import type { Metadata } from "next";
import { Cautions } from "@/components/safety/cautions";
import { KeyCalculator } from "@/components/measure/key-calculator";

export const metadata: Metadata = { title: "Identify a key" };

export default function MeasureKeyPage() {
  return (
    <div className="space-y-8">
      <KeyCalculator />
      <Cautions kinds={["drivers"]} />
    </div>
  );
}
