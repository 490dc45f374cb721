import type { Metadata } from "next";
import { Cautions } from "@/components/safety/cautions";
import { PackingCalculator } from "@/components/measure/packing-calculator";

export const metadata: Metadata = { title: "Size gland packing" };

export default function MeasurePackingPage() {
  return (
    <div className="space-y-8">
      <PackingCalculator />
      <Cautions kinds={["glands", "coolant"]} />
    </div>
  );
}
