export function Button({
  variant = "primary",
  className = "",
  ...props
}: { variant?: "primary" | "quiet" | "danger" } & React.ButtonHTMLAttributes<HTMLButtonElement>) {
  const look =
    variant === "primary"
      ? "bg-ink text-paper hover:opacity-90"
      : variant === "danger"
        ? "border border-accent text-accent hover:bg-paper-2"
        : "border border-rule hover:bg-paper-2";
  return (
    <button className={`rounded px-3 py-1.5 text-sm font-medium disabled:opacity-50 ${look} ${className}`} {...props} />
  );
}
