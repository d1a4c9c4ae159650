#include "app/brume_main.hpp"

int main(int argc, char** argv) {
  return brume::app::brume_main(argc, argv);
}
