-heading
end
