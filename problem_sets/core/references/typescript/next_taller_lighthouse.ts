// A stack of indices still waiting for a taller lighthouse, heights non-increasing.
const result: bigint[] = new Array(heights.length).fill(-1n);
const waiting: number[] = [];
heights.forEach((height, i) => {
  while (waiting.length > 0 && heights[waiting[waiting.length - 1]] < height) {
    result[waiting.pop()!] = BigInt(i);
  }
  waiting.push(i);
});
return result;
}
