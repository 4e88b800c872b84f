if (fullName === "") return "";
return fullName
  .split(" ")
  .map((word) => {
    // The first code point, which may be a surrogate pair.
    const [first] = word;
    return first >= "a" && first <= "z" ? first.toUpperCase() : first;
  })
  .join("");
}
