"use client";
import { useEffect, useState } from "react";

export function ThemeToggle() {
  const [dark, setDark] = useState(false);
  useEffect(() => setDark(document.documentElement.classList.contains("dark")), []);
  return (
    <button
      type="button"
      className="rounded border border-rule px-2 py-1 hover:bg-paper-2"
      aria-pressed={dark}
      onClick={() => {
        const next = !dark;
        document.documentElement.classList.toggle("dark", next);
        localStorage.setItem("echoline-theme", next ? "dark" : "light");
        setDark(next);
      }}
    >
      {dark ? "Light theme" : "Dark theme"}
    </button>
  );
}
