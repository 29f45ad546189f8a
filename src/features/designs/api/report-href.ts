/** The PDF of one revision is a plain download: the browser follows the link with its cookie. */
export const reportHref = (designId: string, revision: number) =>
  `/api/designs/${encodeURIComponent(designId)}/revisions/${revision}/report.pdf`;
