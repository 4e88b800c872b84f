// Spreading a string iterates code points, so surrogate pairs stay together.
return [...text].reverse().join("");
}
