import type { Metadata } from "next";
import { BeltCalculator } from "@/components/measure/belt-calculator";
import { Cautions } from "@/components/safety/cautions";
import { BELT_MEASURING_NOTES } from "@/lib/standards/belts";

export const metadata: Metadata = { title: "Measure a V-belt" };

export default function MeasureBeltPage() {
  return (
    <div className="space-y-8">
      <BeltCalculator measuringNotes={BELT_MEASURING_NOTES} />
      <Cautions kinds={["belts"]} />
    </div>
  );
}
