// Small line icons of our own for the navigation rail (stroke follows the text colour).
const common = { viewBox: '0 0 16 16', fill: 'none', stroke: 'currentColor', strokeWidth: 1.5, strokeLinecap: 'round', strokeLinejoin: 'round' } as const;

export const NotebookIcon = () => (
  <svg {...common}>
    <rect x="3" y="1.75" width="10" height="12.5" rx="1.5" />
    <path d="M5.5 1.75v12.5M8 5h3M8 7.5h3" />
  </svg>
);

export const PeopleIcon = () => (
  <svg {...common}>
    <circle cx="6" cy="5.5" r="2.25" />
    <path d="M1.75 13.5c.5-2.3 2.2-3.5 4.25-3.5s3.75 1.2 4.25 3.5M10.5 3.5a2 2 0 0 1 0 4M12.5 10.2c1 .5 1.6 1.6 1.8 3.3" />
  </svg>
);

export const MailIcon = () => (
  <svg {...common}>
    <rect x="1.75" y="3.25" width="12.5" height="9.5" rx="1.5" />
    <path d="m2.25 4 5.75 4.5L13.75 4" />
  </svg>
);

export const CountersignIcon = () => (
  <svg {...common}>
    <path d="M2 12.5c1.5-2 2.5-4.5 3.5-4.5s.5 3 1.5 3 1.5-2 2.5-2 1 1.5 2 1.5" />
    <path d="M2 14.25h12M10.5 2.5l3 3-5 5-3.5.5.5-3.5z" />
  </svg>
);
