match = /\A([A-Z]+)([0-9]{1,18})\z/.match(code)
match && [match[1], match[2].to_i]
end
