/**
 * Largest-Triangle-Three-Buckets downsampling (S. Steinarsson, "Downsampling Time Series for
 * Visual Representation", MSc thesis, University of Iceland, 2013). Keeps the first and last
 * points; splits the rest into `threshold − 2` buckets and from each keeps the point that makes
 * the largest triangle with the point kept before it and the average of the next bucket. The
 * shape a reader sees survives; the 100,000 raw points never reach a browser.
 */
export function lttb<T>(points: T[], threshold: number, x: (p: T) => number, y: (p: T) => number): T[] {
  const n = points.length;
  const want = Math.floor(threshold);
  if (!(want > 0)) return [];
  if (want >= n) return points.slice();
  const first = points[0] as T;
  const last = points[n - 1] as T;
  if (want === 1) return [first];
  if (want === 2) return [first, last];

  const xs = new Float64Array(n);
  const ys = new Float64Array(n);
  for (let k = 0; k < n; k++) {
    const p = points[k] as T;
    xs[k] = finite(x(p));
    ys[k] = finite(y(p));
  }
  const every = (n - 2) / (want - 2);
  const sampled: T[] = [first];
  let a = 0;
  for (let b = 0; b < want - 2; b++) {
    // Average of the next bucket (the last point when this is the last bucket).
    const avgStart = Math.floor((b + 1) * every) + 1;
    const avgEnd = Math.min(Math.floor((b + 2) * every) + 1, n);
    let avgX = 0;
    let avgY = 0;
    for (let k = avgStart; k < avgEnd; k++) {
      avgX += xs[k] as number;
      avgY += ys[k] as number;
    }
    const count = avgEnd - avgStart;
    avgX /= count;
    avgY /= count;

    const from = Math.floor(b * every) + 1;
    const to = Math.floor((b + 1) * every) + 1;
    const ax = xs[a] as number;
    const ay = ys[a] as number;
    let maxArea = -1;
    let chosen = from;
    for (let k = from; k < to; k++) {
      const area = Math.abs((ax - avgX) * ((ys[k] as number) - ay) - (ax - (xs[k] as number)) * (avgY - ay)) * 0.5;
      if (area > maxArea) {
        maxArea = area;
        chosen = k;
      }
    }
    sampled.push(points[chosen] as T);
    a = chosen;
  }
  sampled.push(last);
  return sampled;
}

function finite(value: number): number {
  return Number.isFinite(value) ? value : 0;
}
