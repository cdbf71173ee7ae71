/** Speed and size targets on the 2-core machine (issue 14), shown beside the measured figures. */
export const TARGETS = {
  /** ms, the whole sizing study by model size */
  studyMs: { 50: 10, 200: 40, 500: 200, 2000: 5000 } as Record<number, number>,
  /** ml-matrix time ÷ new solver time, at 500 nodes */
  eigenRatioAt500: 5,
  /** busy health p95 ≤ factor × idle p95 + slack */
  health: { factor: 2, slackMs: 5 },
  listP95Ms: 100,
  /** gzip bytes */
  initialGzipBytes: 150_000,
  largestRouteGzipBytes: 400_000,
}
