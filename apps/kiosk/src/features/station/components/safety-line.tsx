export function SafetyLine() {
  return (
    <p className="flex items-center gap-5 rounded-lg border-2 border-ink-muted px-6 py-4 text-kiosk-body">
      <svg
        viewBox="0 0 24 24"
        fill="none"
        stroke="currentColor"
        strokeWidth={2.25}
        strokeLinecap="round"
        strokeLinejoin="round"
        aria-hidden="true"
        focusable="false"
        className="size-10 shrink-0"
      >
        <path d="M12 3l9.5 17h-19zM12 10v4.5M12 17.5v.01" />
      </svg>
      <span>The shop’s own rules, local codes and your in-person training always come first.</span>
    </p>
  );
}
