import type { SVGProps } from "react";

// The caution levels' marks, drawn here as plain SVG: no hooks and no client module, so a server page
// that renders a caution sends the mark in its HTML and nothing to run for it. Stroked in the text's
// colour, like the words beside them.

type MarkProps = Omit<SVGProps<SVGSVGElement>, "children">;

function Mark({ children, ...props }: MarkProps & { children: React.ReactNode }) {
  return (
    <svg
      xmlns="http://www.w3.org/2000/svg"
      viewBox="0 0 24 24"
      fill="none"
      stroke="currentColor"
      strokeWidth={2}
      strokeLinecap="round"
      strokeLinejoin="round"
      {...props}
    >
      {children}
    </svg>
  );
}

/** Danger: a stop-sign octagon with an exclamation mark. */
export function DangerMark(props: MarkProps) {
  return (
    <Mark {...props}>
      <polygon points="7.9,2 16.1,2 22,7.9 22,16.1 16.1,22 7.9,22 2,16.1 2,7.9" />
      <path d="M12 7v6M12 16.5v.5" />
    </Mark>
  );
}

/** Warning: a triangle with an exclamation mark. */
export function WarningMark(props: MarkProps) {
  return (
    <Mark {...props}>
      <path d="M12 3 22 20.5H2Z" />
      <path d="M12 9.5v5M12 17.5v.5" />
    </Mark>
  );
}

/** Notice: a circle with a small "i". */
export function NoticeMark(props: MarkProps) {
  return (
    <Mark {...props}>
      <circle cx="12" cy="12" r="10" />
      <path d="M12 11v6M12 7.5v.5" />
    </Mark>
  );
}
