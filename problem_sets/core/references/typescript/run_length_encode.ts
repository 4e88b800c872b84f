const chars = [...text];
let out = "";
let i = 0;
while (i < chars.length) {
  let j = i;
  while (j < chars.length && chars[j] === chars[i]) j++;
  out += `${j - i}${chars[i]}`;
  i = j;
}
return out;
}
