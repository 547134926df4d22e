/**
 * In-place radix-2 fast Fourier transform on Float64Arrays. Written here
 * because mathjs's `fft` works on generic Complex arrays through typed
 * dispatch, which costs far more than the 20 ms a live screen allows for
 * 8192 points; this loop does the same arithmetic on flat arrays.
 */

/**
 * Inverse DFT x[n] = (1/N)·Σ X[k]·e^(+2πjkn/N), in place on (re, im).
 * Method: iterative Cooley–Tukey decimation in time with bit-reversed input
 *   (Cooley & Tukey, Math. Comp. 19, 1965, pp. 297–301).
 * Valid:  length a power of two ≥ 2; round-off ~ log2(N)·1e-16 relative.
 */
export function inverseFft(re: Float64Array, im: Float64Array): void {
  const n = re.length;
  if (n < 2 || (n & (n - 1)) !== 0 || im.length !== n) {
    throw new RangeError('inverseFft needs two arrays of one power-of-two length');
  }
  for (let i = 1, j = 0; i < n; i++) {
    let bit = n >> 1;
    for (; j & bit; bit >>= 1) j ^= bit;
    j |= bit;
    if (i < j) {
      [re[i], re[j]] = [re[j], re[i]];
      [im[i], im[j]] = [im[j], im[i]];
    }
  }
  for (let size = 2; size <= n; size <<= 1) {
    const half = size >> 1;
    const angle = (2 * Math.PI) / size;
    const wRe = Math.cos(angle);
    const wIm = Math.sin(angle);
    for (let start = 0; start < n; start += size) {
      let uRe = 1;
      let uIm = 0;
      for (let k = 0; k < half; k++) {
        const a = start + k;
        const b = a + half;
        const tRe = re[b] * uRe - im[b] * uIm;
        const tIm = re[b] * uIm + im[b] * uRe;
        re[b] = re[a] - tRe;
        im[b] = im[a] - tIm;
        re[a] += tRe;
        im[a] += tIm;
        const next = uRe * wRe - uIm * wIm;
        uIm = uRe * wIm + uIm * wRe;
        uRe = next;
      }
    }
  }
  for (let i = 0; i < n; i++) {
    re[i] /= n;
    im[i] /= n;
  }
}
