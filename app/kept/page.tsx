import type { Metadata } from "next";
import { KeptOnDevice } from "@/components/offline/kept-on-device";

export const metadata: Metadata = { title: "Kept on this device" };

export default function KeptPage() {
  return (
    <div className="space-y-6">
      <header className="space-y-2">
        <h1 className="text-3xl">Kept on this device</h1>
        <p className="text-ink-soft">
          The parts and job lists you opened on this device, as they were last fetched, for when there is no signal in
          the shed. They are forgotten when you sign out.
        </p>
      </header>
      <KeptOnDevice />
    </div>
  );
}
