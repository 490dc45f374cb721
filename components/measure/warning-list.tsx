import { Notice } from "@/components/ui/notice";

/** The warnings of a calculation, each in its own caution box. */
export function WarningList({ warnings }: { warnings: string[] | undefined }) {
  return (
    <>
      {(warnings ?? []).map((w) => (
        <Notice key={w} tone="caution">
          {w}
        </Notice>
      ))}
    </>
  );
}
