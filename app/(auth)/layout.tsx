export default function AuthLayout({ children }: { children: React.ReactNode }) {
  return (
    <div className="mx-auto max-w-md">
      <div
        className={
          "rounded-xl border-2 border-ink/80 bg-ground-raised p-6 " + "shadow-[6px_6px_0_0_rgba(35,38,43,0.85)] sm:p-8"
        }
      >
        {children}
      </div>
    </div>
  );
}
