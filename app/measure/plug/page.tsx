import type { Metadata } from "next";
import { Cautions } from "@/components/safety/cautions";
import { PlugCalculator } from "@/components/measure/plug-calculator";

export const metadata: Metadata = { title: "Measure a cup or disc plug" };

export default function MeasurePlugPage() {
  return (
    <div className="space-y-8">
      <PlugCalculator />
      <Cautions kinds={["drivers", "coolant"]} />
    </div>
  );
}
