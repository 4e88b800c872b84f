const match = /^([A-Z]+)([0-9]{1,18})$/.exec(code);
return match === null ? null : [match[1], BigInt(match[2])];
}
