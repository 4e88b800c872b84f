use strict;
use warnings;

my @numbers = split ' ', do { local $/; <STDIN> };
my $n = shift @numbers;
my ($total, $heaviest) = (0, 0);
for my $w (@numbers[0 .. $n - 1]) {
    $total += $w;
    $heaviest = $w if $w > $heaviest;
}
print "$total $heaviest\n";
