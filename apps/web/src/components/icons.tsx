import type { SVGProps } from 'react';

// Catline's own line icons: 24-unit grid, 2-unit stroke, drawn in the current text colour.
function LineIcon({ children, ...props }: SVGProps<SVGSVGElement>) {
  return (
    <svg
      width="1em"
      height="1em"
      viewBox="0 0 24 24"
      fill="none"
      stroke="currentColor"
      strokeWidth={2}
      strokeLinecap="round"
      strokeLinejoin="round"
      aria-hidden="true"
      focusable="false"
      {...props}
    >
      {children}
    </svg>
  );
}

export const GripIcon = (props: SVGProps<SVGSVGElement>) => (
  <LineIcon {...props}>
    <path d="M9 5h.01M15 5h.01M9 12h.01M15 12h.01M9 19h.01M15 19h.01" strokeWidth={3} />
  </LineIcon>
);

export const CautionIcon = (props: SVGProps<SVGSVGElement>) => (
  <LineIcon {...props}>
    <path d="M12 3 2.5 20h19L12 3Z" />
    <path d="M12 10v4M12 17h.01" />
  </LineIcon>
);

export const SunIcon = (props: SVGProps<SVGSVGElement>) => (
  <LineIcon {...props}>
    <circle cx="12" cy="12" r="4" />
    <path d="M12 2v2M12 20v2M2 12h2M20 12h2M4.9 4.9l1.4 1.4M17.7 17.7l1.4 1.4M4.9 19.1l1.4-1.4M17.7 6.3l1.4-1.4" />
  </LineIcon>
);

export const MoonIcon = (props: SVGProps<SVGSVGElement>) => (
  <LineIcon {...props}>
    <path d="M20 14.5A8 8 0 0 1 9.5 4a8 8 0 1 0 10.5 10.5Z" />
  </LineIcon>
);

/** Three rising bars: a line of aircraft leaving in order. */
export const LineupIcon = (props: SVGProps<SVGSVGElement>) => (
  <LineIcon {...props}>
    <path d="M4 19h16M7 14h10M10 9h4" />
  </LineIcon>
);

export const WindIcon = (props: SVGProps<SVGSVGElement>) => (
  <LineIcon {...props}>
    <path d="M3 9h11a3 3 0 1 0-3-3M3 15h15a3 3 0 1 1-3 3" />
  </LineIcon>
);

/** Three dots in a row: more actions for the item beside it. */
export const MoreIcon = (props: SVGProps<SVGSVGElement>) => (
  <LineIcon {...props}>
    <path d="M5 12h.01M12 12h.01M19 12h.01" strokeWidth={3.5} />
  </LineIcon>
);
