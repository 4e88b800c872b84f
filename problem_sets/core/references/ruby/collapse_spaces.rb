text.split(/[ \t\n]+/).reject(&:empty?).join(" ")
end
