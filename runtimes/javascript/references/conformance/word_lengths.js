const lengths = {};
for (const word of words) lengths[word] = BigInt([...word].length);
return lengths;
}
