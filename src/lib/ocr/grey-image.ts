/**
 * A one-channel picture as plain bytes. The browser (canvas pixels) and Node (sharp's raw output) both
 * turn their pictures into this, so the pre-processing the camera does is the same code the CLI and the
 * accuracy tests measure.
 */
export interface GreyImage {
  width: number;
  height: number;
  data: Uint8Array;
}

/** Luma from RGBA (or RGB with `channels` 3) bytes, with the Rec. 601 weights in integer form. */
export function greyFromPixels(pixels: ArrayLike<number>, width: number, height: number, channels = 4): GreyImage {
  const data = new Uint8Array(width * height);
  for (let i = 0, p = 0; i < data.length; i++, p += channels) {
    data[i] = (pixels[p]! * 77 + pixels[p + 1]! * 150 + pixels[p + 2]! * 29) >> 8;
  }
  return { width, height, data };
}

export function crop(image: GreyImage, x: number, y: number, width: number, height: number): GreyImage {
  const x0 = Math.max(0, Math.round(x));
  const y0 = Math.max(0, Math.round(y));
  const w = Math.max(1, Math.min(image.width - x0, Math.round(width)));
  const h = Math.max(1, Math.min(image.height - y0, Math.round(height)));
  const data = new Uint8Array(w * h);
  for (let row = 0; row < h; row++) data.set(image.data.subarray((y0 + row) * image.width + x0, (y0 + row) * image.width + x0 + w), row * w);
  return { width: w, height: h, data };
}

/** Bilinear resampling; shrinking by more than two first averages boxes so thin strokes survive. */
export function scale(image: GreyImage, factor: number): GreyImage {
  if (Math.abs(factor - 1) < 0.02) return image;
  let source = image;
  while (factor < 0.5) {
    source = halve(source);
    factor *= 2;
  }
  const width = Math.max(1, Math.round(source.width * factor));
  const height = Math.max(1, Math.round(source.height * factor));
  const data = new Uint8Array(width * height);
  const sx = source.width / width;
  const sy = source.height / height;
  for (let y = 0; y < height; y++) {
    const fy = Math.max(0, (y + 0.5) * sy - 0.5);
    const y0 = Math.min(source.height - 1, Math.floor(fy));
    const y1 = Math.min(source.height - 1, y0 + 1);
    const wy = fy - y0;
    for (let x = 0; x < width; x++) {
      const fx = Math.max(0, (x + 0.5) * sx - 0.5);
      const x0 = Math.min(source.width - 1, Math.floor(fx));
      const x1 = Math.min(source.width - 1, x0 + 1);
      const wx = fx - x0;
      const top = source.data[y0 * source.width + x0]! * (1 - wx) + source.data[y0 * source.width + x1]! * wx;
      const bottom = source.data[y1 * source.width + x0]! * (1 - wx) + source.data[y1 * source.width + x1]! * wx;
      data[y * width + x] = Math.round(top * (1 - wy) + bottom * wy);
    }
  }
  return { width, height, data };
}

function halve(image: GreyImage): GreyImage {
  const width = Math.max(1, image.width >> 1);
  const height = Math.max(1, image.height >> 1);
  const data = new Uint8Array(width * height);
  for (let y = 0; y < height; y++) {
    for (let x = 0; x < width; x++) {
      const a = (2 * y) * image.width + 2 * x;
      const b = Math.min(2 * y + 1, image.height - 1) * image.width + 2 * x;
      const dx = 2 * x + 1 < image.width ? 1 : 0;
      data[y * width + x] = (image.data[a]! + image.data[a + dx]! + image.data[b]! + image.data[b + dx]! + 2) >> 2;
    }
  }
  return { width, height, data };
}

/**
 * Evens out light that falls unevenly across a card: each pixel is compared with the brightest paper
 * near it (a blurred running maximum per column band), so a shadow at one end does not swallow digits.
 */
export function flattenLight(image: GreyImage, window = Math.max(8, Math.round(image.height / 2))): GreyImage {
  const { width, height } = image;
  const colMax = new Float32Array(width);
  // The 10th percentile from the top of each column (paper, even where ink covers part of it), from a
  // 64-bin histogram: no sorting, so a frame's columns cost one pass each.
  const bins = new Uint16Array(64);
  const want = Math.max(1, Math.floor(height * 0.1));
  for (let x = 0; x < width; x++) {
    bins.fill(0);
    for (let y = 0; y < height; y++) bins[image.data[y * width + x]! >> 2]!++;
    let seen = 0;
    let bin = 63;
    for (; bin > 0; bin--) {
      seen += bins[bin]!;
      if (seen >= want) break;
    }
    colMax[x] = bin * 4 + 2;
  }
  const smooth = new Float32Array(width);
  let sum = 0;
  const half = window;
  for (let x = 0; x < Math.min(width, half); x++) sum += colMax[x]!;
  for (let x = 0; x < width; x++) {
    if (x + half < width) sum += colMax[x + half]!;
    if (x - half - 1 >= 0) sum -= colMax[x - half - 1]!;
    const count = Math.min(width - 1, x + half) - Math.max(0, x - half) + 1;
    smooth[x] = Math.max(1, sum / count);
  }
  const data = new Uint8Array(width * height);
  for (let y = 0; y < height; y++) {
    for (let x = 0; x < width; x++) {
      const v = (image.data[y * width + x]! / smooth[x]!) * 255;
      data[y * width + x] = v > 255 ? 255 : v;
    }
  }
  return { width, height, data };
}

/** Stretches the darkest and lightest 1% to black and white. */
export function stretchContrast(image: GreyImage): GreyImage {
  const histogram = histogramOf(image);
  const total = image.data.length;
  let low = 0;
  let high = 255;
  for (let seen = 0; low < 255 && seen + histogram[low]! < total * 0.01; low++) seen += histogram[low]!;
  for (let seen = 0; high > 0 && seen + histogram[high]! < total * 0.01; high--) seen += histogram[high]!;
  if (high - low < 16) return image;
  const data = new Uint8Array(total);
  const span = 255 / (high - low);
  for (let i = 0; i < total; i++) {
    const v = (image.data[i]! - low) * span;
    data[i] = v < 0 ? 0 : v > 255 ? 255 : v;
  }
  return { width: image.width, height: image.height, data };
}

/** Otsu's threshold: the grey level that best splits ink from paper (Otsu 1979). */
export function otsuLevel(image: GreyImage): number {
  const histogram = histogramOf(image);
  const total = image.data.length;
  let sumAll = 0;
  for (let i = 0; i < 256; i++) sumAll += i * histogram[i]!;
  let sumBack = 0;
  let weightBack = 0;
  let best = 0;
  let level = 128;
  for (let t = 0; t < 256; t++) {
    weightBack += histogram[t]!;
    if (weightBack === 0) continue;
    const weightFore = total - weightBack;
    if (weightFore === 0) break;
    sumBack += t * histogram[t]!;
    const meanBack = sumBack / weightBack;
    const meanFore = (sumAll - sumBack) / weightFore;
    const between = weightBack * weightFore * (meanBack - meanFore) ** 2;
    if (between > best) {
      best = between;
      level = t;
    }
  }
  return level;
}

/** Black ink on white paper at `level` (shifted by `bias` to thicken or thin the strokes). */
export function threshold(image: GreyImage, level: number): GreyImage {
  const data = new Uint8Array(image.data.length);
  for (let i = 0; i < data.length; i++) data[i] = image.data[i]! <= level ? 0 : 255;
  return { width: image.width, height: image.height, data };
}

/** Adds a white margin: the recogniser finds a line more reliably when it does not touch the edge. */
export function pad(image: GreyImage, margin: number): GreyImage {
  const width = image.width + margin * 2;
  const height = image.height + margin * 2;
  const data = new Uint8Array(width * height).fill(255);
  for (let y = 0; y < image.height; y++) data.set(image.data.subarray(y * image.width, (y + 1) * image.width), (y + margin) * width + margin);
  return { width, height, data };
}

/** A binary PGM (P5) file: the simplest picture format the recogniser's image library reads, in Node and in the browser. */
export function toPgm(image: GreyImage): Uint8Array {
  const header = new TextEncoder().encode(`P5\n${image.width} ${image.height}\n255\n`);
  const file = new Uint8Array(header.length + image.data.length);
  file.set(header, 0);
  file.set(image.data, header.length);
  return file;
}

function histogramOf(image: GreyImage): Uint32Array {
  const histogram = new Uint32Array(256);
  for (let i = 0; i < image.data.length; i++) histogram[image.data[i]!]!++;
  return histogram;
}
