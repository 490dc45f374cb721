import type { Metadata } from "next";
import { Cautions } from "@/components/safety/cautions";
import { GasketDesigner } from "@/components/measure/gasket-designer";
import { designerValues } from "@/lib/measure/gasket-form";

export const metadata: Metadata = { title: "Draw a gasket template" };

type Search = Promise<Record<string, string | string[] | undefined>>;

export default async function MeasureGasketPage({ searchParams }: { searchParams: Search }) {
  const params = await searchParams;
  const q = Object.fromEntries(Object.entries(params).map(([k, v]) => [k, Array.isArray(v) ? v[0] : v]));
  const unit = q.unit === "mm" || q.unit === "in" ? q.unit : null;
  return (
    <div className="space-y-8">
      <GasketDesigner initial={designerValues(q)} initialUnit={unit} />
      <Cautions kinds={["gaskets"]} />
    </div>
  );
}
