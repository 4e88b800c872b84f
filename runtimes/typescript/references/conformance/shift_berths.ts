const shifted = new Map<bigint, string>();
for (const [berth, vessel] of owners) shifted.set(berth + offset, vessel);
return shifted;
}
