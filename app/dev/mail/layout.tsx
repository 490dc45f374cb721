import { notFound } from "next/navigation";
import { Notice } from "@/components/ui/notice";
import { isProduction } from "@/lib/env";

export const dynamic = "force-dynamic";

export default function CapturedMailLayout({ children }: { children: React.ReactNode }) {
  if (isProduction) notFound();
  return (
    <div className="space-y-6">
      <Notice>
        Demo installation: the mail Understudy sends is captured here instead of being delivered. This page does not
        exist in production.
      </Notice>
      {children}
    </div>
  );
}
