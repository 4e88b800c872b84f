name, enabled = entry
"#{name}#{enabled ? ':on' : ':off'}#{suffix}"
end
