"use client";
// The lasting confirmation of /review/flags. A resolved flag's row leaves the list when the page refreshes,
// taking its form with it, so the confirmation lives here, above the list: a live region that is always on
// the page (so screen readers announce what is put in it), and it takes focus so keyboard users are not
// left on a removed button.
import { createContext, useCallback, useContext, useEffect, useRef, useState, type ReactNode } from "react";
import { alertClass } from "@/components/ui/form";
import { flagResolutionMessage, type ResolvedFlag } from "@/lib/flag-resolution-message";

type Announce = (resolved: ResolvedFlag, packTitle: string) => void;
const AnnounceContext = createContext<Announce>(() => {});

export const useAnnounceResolvedFlag = () => useContext(AnnounceContext);

export function ResolvedFlagNotice({ children }: { children: ReactNode }) {
  const [notice, setNotice] = useState<{ seq: number; text: string } | null>(null);
  const region = useRef<HTMLDivElement>(null);
  const announce = useCallback<Announce>((resolved, packTitle) => {
    setNotice((n) => ({ seq: (n?.seq ?? 0) + 1, text: flagResolutionMessage(resolved, packTitle) }));
  }, []);
  useEffect(() => {
    if (notice) region.current?.focus();
  }, [notice]);
  return (
    <AnnounceContext value={announce}>
      {/* Empty, it is visually hidden but stays in the accessibility tree (display:none would not be announced). */}
      <div
        ref={region}
        tabIndex={-1}
        role="status"
        data-testid="flag-resolved"
        className={notice ? "scroll-mt-24 rounded-md" : "sr-only"}
      >
        {notice ? (
          <p key={notice.seq} className={alertClass("success")}>
            {notice.text}
          </p>
        ) : null}
      </div>
      {children}
    </AnnounceContext>
  );
}
