import type { Metadata } from "next";
import { Cautions } from "@/components/safety/cautions";
import { ChainCalculator } from "@/components/measure/chain-calculator";

export const metadata: Metadata = { title: "Identify a roller chain" };

export default function MeasureChainPage() {
  return (
    <div className="space-y-8">
      <ChainCalculator />
      <Cautions kinds={["chains"]} />
    </div>
  );
}
