const kept = plate.replace(/[^A-Za-z0-9]/gu, "").toLowerCase();
return kept === [...kept].reverse().join("");
}
