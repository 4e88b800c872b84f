const shifted = new Map();
for (const [berth, vessel] of owners) shifted.set(berth + offset, vessel);
return shifted;
}
