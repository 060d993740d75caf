package coilwright;

public final class App {
    public static void main(String[] args) {
        System.out.println("coilwright");
    }
}
