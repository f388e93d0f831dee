import { Spinner } from "@/components/ui/spinner";

/** Shown while the first page's data (the session check) loads. */
export function HydrateFallback() {
  return (
    <div className="flex min-h-dvh items-center justify-center bg-bone-50">
      <Spinner label="Heating up" />
    </div>
  );
}
