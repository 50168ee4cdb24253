package app.latentledger.ui.entry;

import app.latentledger.ui.session.Slot;

/** Types a number on the pad of a box and presses Enter, as the tech's taps would. */
public final class Typing {
    private Typing() {
    }

    public static void type(EntryViewModel vm, Slot slot, String number) {
        vm.select(slot);
        vm.pad().clear();
        for (char c : number.toCharArray()) {
            if (c == '.') {
                vm.pad().point();
            } else if (c == '-') {
                vm.pad().sign();
            } else {
                vm.pad().digit(c - '0');
            }
        }
        vm.enter();
    }
}
