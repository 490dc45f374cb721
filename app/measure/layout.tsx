import { MeasureTabs } from "@/components/measure/measure-tabs";

export default function MeasureLayout({ children }: { children: React.ReactNode }) {
  return (
    <div className="space-y-6">
      <div className="no-print space-y-2">
        <h1 className="text-2xl sm:text-3xl">Measure a part</h1>
        <p className="max-w-3xl text-ink-soft max-sm:hidden">
          No number left on it? Measure it with calipers, in inches or millimetres, and see which standard parts it can
          be. Worn parts read a little off; the answers allow for the way wear moves each size, and point out inch and
          metric sizes that are easy to mistake for each other.
        </p>
      </div>
      <div className="no-print">
        <MeasureTabs />
      </div>
      {children}
    </div>
  );
}
