if (name === null || name === "") return `Crate #${number}`;
return `${name} #${number}`;
}
