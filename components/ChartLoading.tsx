// Where a chart will be while its script loads. Charts are loaded after the page (next/dynamic,
// ssr: false): recharts is the app's largest script, and parsing it and drawing hundreds of points
// held up the first click on pages whose figures and tables are ready long before.
export function ChartLoading({ height = 360 }: { height?: number | string }) {
  return <div aria-hidden="true" style={{ height }} className="animate-pulse rounded-md bg-paper-sunk" />;
}
