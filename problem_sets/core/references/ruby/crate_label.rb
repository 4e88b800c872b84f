return "Crate ##{number}" if name.nil? || name.empty?

"#{name} ##{number}"
end
