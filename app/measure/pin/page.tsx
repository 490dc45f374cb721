import type { Metadata } from "next";
import { Cautions } from "@/components/safety/cautions";
import { PinCalculator } from "@/components/measure/pin-calculator";

export const metadata: Metadata = { title: "Identify a taper pin" };

export default function MeasurePinPage() {
  return (
    <div className="space-y-8">
      <PinCalculator />
      <Cautions kinds={["drivers"]} />
    </div>
  );
}
