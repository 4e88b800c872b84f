return line
  .split(" ")
  .filter((word) => word !== "")
  .reverse()
  .join(" ");
}
