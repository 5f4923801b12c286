export interface PlanDownloadProps {
  /** The plan's address, e.g. `/api/designs/:id/plan.pdf`. */
  readonly href: string;
  /** When set, the links are replaced by this sentence (e.g. "Save the quilt to download its plan."). */
  readonly waitText?: string | null;
  readonly className?: string;
}

/**
 * The two downloads of a printed plan: one page per block (true size where it fits), and true size on tiles for a
 * block bigger than the paper. Plain links with `download`, so the browser saves the file; hidden when printing.
 */
export function PlanDownload({ href, waitText = null, className = '' }: PlanDownloadProps) {
  if (waitText) return <span className={`text-sm text-denim-700 print:hidden ${className}`}>{waitText}</span>;
  return (
    <span className={`flex flex-wrap items-center gap-2 print:hidden ${className}`}>
      <a href={href} download data-plan-download="page" className="rounded border border-denim-600 px-3 py-1 text-sm font-semibold text-denim-700 hover:bg-muslin-100">
        Printable plan (PDF)
      </a>
      <a href={`${href}?layout=tiles`} download data-plan-download="tiles" className="rounded border border-denim-600 px-3 py-1 text-sm text-denim-700 hover:bg-muslin-100" title="Every block at true size; a block bigger than the paper is split over several pages to tape together">
        True-size tiles (PDF)
      </a>
    </span>
  );
}
