if (fullName === "") return "";
return fullName
  .split(" ")
  .map((word) => {
    const first = String.fromCodePoint(word.codePointAt(0));
    return first >= "a" && first <= "z" ? first.toUpperCase() : first;
  })
  .join("");
}
