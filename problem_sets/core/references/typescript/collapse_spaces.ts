return text
  .split(/[ \t\n]+/)
  .filter((part) => part !== "")
  .join(" ");
}
